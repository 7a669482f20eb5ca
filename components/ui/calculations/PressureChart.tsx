import { Fragment, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui';
import { CAUTION_SHARE_OF_RATING } from '@/lib/chemistry/carbonation';
import { colors, fonts, space } from '@/lib/theme';
import { barToPsi, cToF, formatNumber, type UnitSystem } from '@/lib/units';

interface Point {
  tempC: number;
  gaugeBar: number;
}

interface Props {
  worst: Point[];
  expected: Point[];
  ratingBar: number | null;
  units: UnitSystem;
  /** Measured points (a batch's test bottles), drawn as dots in their check's colour. */
  marks?: (Point & { level: 'ok' | 'caution' | 'danger' })[];
  /** The recipe's own moments on the worst-case curve: carbonating, cold store, the warm day. */
  moments?: (Point & { label: string })[];
}

const HEIGHT = 230;
const MARGIN = { top: 30, right: 16, bottom: 36, left: 48 };

/** A step of 1, 2 or 5 × 10^n that gives about `count` ticks up to `max`. */
function niceStep(max: number, count: number): number {
  const raw = max / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const unit = raw / power;
  return (unit <= 1 ? 1 : unit <= 2 ? 2 : unit <= 5 ? 5 : 10) * power;
}

/**
 * Gauge pressure against temperature for this bottle: its safe, caution and danger bands shaded behind (caution from
 * 75 % of the rating, danger from the rating), the worst and expected cases across them, and the recipe's own
 * moments (carbonating, cold store, the warm day) marked on the worst case.
 */
export function PressureChart({ worst, expected, ratingBar, units, marks = [], moments = [] }: Props) {
  const [width, setWidth] = useState(0);
  const toP = (bar: number) => (units === 'us' ? barToPsi(bar) : bar);
  const pUnit = units === 'us' ? 'psi' : 'bar';
  const tUnit = units === 'us' ? '°F' : '°C';
  const all = [...worst, ...expected, ...marks];
  if (worst.length === 0) return null;
  const minT = Math.min(...all.map((p) => p.tempC));
  const maxT = Math.max(...all.map((p) => p.tempC));
  const maxP = Math.max(0.5, ...all.map((p) => toP(p.gaugeBar)), ratingBar ? toP(ratingBar) * 1.15 : 0);
  const minP = Math.min(0, ...all.map((p) => toP(p.gaugeBar)));
  const step = niceStep(maxP - minP, 5);
  const top = Math.ceil(maxP / step) * step;
  const bottom = Math.floor(minP / step) * step;
  const plotW = Math.max(10, width - MARGIN.left - MARGIN.right);
  const plotH = HEIGHT - MARGIN.top - MARGIN.bottom;
  const x = (tempC: number) => MARGIN.left + ((tempC - minT) / (maxT - minT || 1)) * plotW;
  const y = (value: number) => MARGIN.top + (1 - (value - bottom) / (top - bottom || 1)) * plotH;
  const path = (points: Point[]) =>
    points.map((p, i) => `${i === 0 ? 'M' : 'L'}${x(p.tempC).toFixed(1)},${y(toP(p.gaugeBar)).toFixed(1)}`).join(' ');
  const yTicks: number[] = [];
  for (let v = bottom; v <= top + step / 2; v += step) yTicks.push(Number(v.toFixed(6)));
  const xTicks = worst.map((p) => p.tempC).filter((t) => t % 10 === 0 || worst.length <= 6);
  const hottest = worst[worst.length - 1];
  const summary = `Gauge pressure from ${formatNumber(toP(worst[0].gaugeBar), 1)} ${pUnit} at ${units === 'us' ? formatNumber(cToF(minT), 0) : minT} ${tUnit} to ${formatNumber(toP(hottest.gaugeBar), 1)} ${pUnit} at ${units === 'us' ? formatNumber(cToF(maxT), 0) : maxT} ${tUnit} in the worst case${ratingBar ? `; bottle rating ${formatNumber(toP(ratingBar), 1)} ${pUnit}` : ''}.`;

  return (
    <View style={styles.wrap} onLayout={(event) => setWidth(event.nativeEvent.layout.width)}>
      <View role="img" aria-label={summary}>
        {width > 0 ? (
          <Svg width={width} height={HEIGHT}>
            {ratingBar ? (
              <>
                <Rect
                  x={MARGIN.left}
                  width={plotW}
                  y={MARGIN.top}
                  height={Math.max(0, y(toP(ratingBar)) - MARGIN.top)}
                  fill={colors.dangerTint}
                />
                <Rect
                  x={MARGIN.left}
                  width={plotW}
                  y={y(toP(ratingBar))}
                  height={Math.max(0, y(toP(ratingBar * CAUTION_SHARE_OF_RATING)) - y(toP(ratingBar)))}
                  fill={colors.cautionTint}
                />
                <Rect
                  x={MARGIN.left}
                  width={plotW}
                  y={y(toP(ratingBar * CAUTION_SHARE_OF_RATING))}
                  height={Math.max(0, y(bottom) - y(toP(ratingBar * CAUTION_SHARE_OF_RATING)))}
                  fill={colors.successTint}
                />
              </>
            ) : null}
            {yTicks.map((v) => (
              <Line
                key={`y${v}`}
                x1={MARGIN.left}
                x2={MARGIN.left + plotW}
                y1={y(v)}
                y2={y(v)}
                stroke={colors.hairline}
                strokeWidth={1}
              />
            ))}
            {yTicks.map((v) => (
              <SvgText
                key={`yl${v}`}
                x={MARGIN.left - 6}
                y={y(v) + 4}
                fontSize={11}
                fontFamily={fonts.regular}
                fill={colors.textMuted}
                textAnchor="end"
              >
                {formatNumber(v, step < 1 ? 1 : 0)}
              </SvgText>
            ))}
            {xTicks.map((t) => (
              <SvgText
                key={`x${t}`}
                x={x(t)}
                y={HEIGHT - MARGIN.bottom + 16}
                fontSize={11}
                fontFamily={fonts.regular}
                fill={colors.textMuted}
                textAnchor="middle"
              >
                {units === 'us' ? formatNumber(cToF(t), 0) : String(t)}
              </SvgText>
            ))}
            <SvgText
              x={MARGIN.left + plotW / 2}
              y={HEIGHT - 4}
              fontSize={12}
              fontFamily={fonts.semibold}
              fill={colors.text}
              textAnchor="middle"
            >
              {`Temperature (${tUnit})`}
            </SvgText>
            <SvgText x={4} y={14} fontSize={12} fontFamily={fonts.semibold} fill={colors.text}>
              {`Gauge (${pUnit})`}
            </SvgText>
            {ratingBar ? (
              <>
                <SvgText
                  x={MARGIN.left + plotW - 4}
                  y={y(toP(ratingBar)) - 6}
                  fontSize={11}
                  fontFamily={fonts.semibold}
                  fill={colors.danger}
                  textAnchor="end"
                >
                  {`Danger: at or over the ${formatNumber(toP(ratingBar), units === 'us' ? 0 : 1)} ${pUnit} rating`}
                </SvgText>
                <SvgText
                  x={MARGIN.left + plotW - 4}
                  y={y(toP(ratingBar * CAUTION_SHARE_OF_RATING)) - 6}
                  fontSize={11}
                  fontFamily={fonts.semibold}
                  fill={colors.caution}
                  textAnchor="end"
                >
                  Caution: within 25 %
                </SvgText>
              </>
            ) : null}
            <Path d={path(expected)} stroke={colors.info} strokeWidth={2} strokeDasharray="3 3" fill="none" />
            <Path d={path(worst)} stroke={colors.primary} strokeWidth={3} fill="none" />
            {moments.map((m, i) => (
              <Fragment key={`n${i}`}>
                <Rect
                  x={x(m.tempC) - 5}
                  y={y(toP(m.gaugeBar)) - 5}
                  width={10}
                  height={10}
                  fill={colors.surface}
                  stroke={colors.text}
                  strokeWidth={2}
                  transform={`rotate(45 ${x(m.tempC)} ${y(toP(m.gaugeBar))})`}
                />
                <SvgText
                  x={x(m.tempC) + (x(m.tempC) > MARGIN.left + plotW / 2 ? -10 : 10)}
                  y={y(toP(m.gaugeBar)) + (i % 2 === 0 ? 16 : -10)}
                  fontSize={11}
                  fontFamily={fonts.semibold}
                  fill={colors.text}
                  textAnchor={x(m.tempC) > MARGIN.left + plotW / 2 ? 'end' : 'start'}
                >
                  {m.label}
                </SvgText>
              </Fragment>
            ))}
            {marks.map((m, i) => (
              <Circle
                key={`m${i}`}
                cx={x(m.tempC)}
                cy={y(toP(m.gaugeBar))}
                r={6}
                fill={m.level === 'danger' ? colors.danger : m.level === 'caution' ? colors.caution : colors.success}
                stroke={colors.surface}
                strokeWidth={2}
              />
            ))}
          </Svg>
        ) : null}
      </View>
      <View style={styles.legend}>
        <LegendItem color={colors.primary} label="Worst case" />
        <LegendItem color={colors.info} label="Expected" dashed />
        {ratingBar ? (
          <>
            <BandItem color={colors.successTint} label="Safe" />
            <BandItem color={colors.cautionTint} label="Caution" />
            <BandItem color={colors.dangerTint} label="Danger" />
          </>
        ) : null}
        {moments.length ? <Text variant="small">◆ this recipe’s moments</Text> : null}
      </View>
    </View>
  );
}

function BandItem({ color, label }: { color: string; label: string }) {
  return (
    <View style={styles.legendItem}>
      <View style={[styles.band, { backgroundColor: color }]} />
      <Text variant="small">{label}</Text>
    </View>
  );
}

function LegendItem({ color, label, dashed = false }: { color: string; label: string; dashed?: boolean }) {
  return (
    <View style={styles.legendItem}>
      <View style={[styles.swatch, { borderColor: color, borderStyle: dashed ? 'dashed' : 'solid' }]} />
      <Text variant="small">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 22, height: 0, borderTopWidth: 3 },
  band: { width: 16, height: 12, borderWidth: 1, borderColor: colors.hairline },
});
