import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Line, Path, Text as SvgText } from 'react-native-svg';

import { PH_LIMIT } from '@/lib/chemistry/carbonation';
import { colors, fonts, space } from '@/lib/theme';

interface Point {
  at: string;
  ph: number;
  level: 'ok' | 'caution' | 'danger';
}

const HEIGHT = 180;
const M = { top: 20, right: 16, bottom: 28, left: 40 };

/** pH readings in the order taken, against the 4.2 limit. */
export function PhChart({ points }: { points: Point[] }) {
  const [width, setWidth] = useState(0);
  if (points.length === 0) return null;
  const low = Math.min(2.5, ...points.map((p) => p.ph));
  const high = Math.max(4.8, ...points.map((p) => p.ph));
  const plotW = Math.max(10, width - M.left - M.right);
  const plotH = HEIGHT - M.top - M.bottom;
  const x = (i: number) => M.left + (points.length === 1 ? plotW / 2 : (i / (points.length - 1)) * plotW);
  const y = (ph: number) => M.top + (1 - (ph - low) / (high - low)) * plotH;
  const path = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${x(i).toFixed(1)},${y(p.ph).toFixed(1)}`).join(' ');
  const summary = `pH readings from ${points[0].ph} to ${points[points.length - 1].ph}; limit ${PH_LIMIT}.`;
  const ticks = [3, 3.5, 4, 4.5].filter((t) => t >= low && t <= high);
  return (
    <View style={styles.wrap} onLayout={(e) => setWidth(e.nativeEvent.layout.width)}>
      <View role="img" aria-label={summary}>
        {width > 0 ? (
          <Svg width={width} height={HEIGHT}>
            {ticks.map((t) => (
              <SvgText
                key={t}
                x={M.left - 6}
                y={y(t) + 4}
                fontSize={11}
                fontFamily={fonts.regular}
                fill={colors.textMuted}
                textAnchor="end"
              >
                {String(t)}
              </SvgText>
            ))}
            <Line
              x1={M.left}
              x2={M.left + plotW}
              y1={y(PH_LIMIT)}
              y2={y(PH_LIMIT)}
              stroke={colors.danger}
              strokeWidth={2}
              strokeDasharray="6 4"
            />
            <SvgText x={M.left + 4} y={y(PH_LIMIT) - 6} fontSize={12} fontFamily={fonts.semibold} fill={colors.danger}>
              {`Limit pH ${PH_LIMIT}`}
            </SvgText>
            <Path d={path} stroke={colors.primary} strokeWidth={2} fill="none" />
            {points.map((p, i) => (
              <Circle
                key={i}
                cx={x(i)}
                cy={y(p.ph)}
                r={5}
                fill={p.level === 'danger' ? colors.danger : p.level === 'caution' ? colors.caution : colors.success}
              />
            ))}
            <SvgText
              x={M.left + plotW / 2}
              y={HEIGHT - 6}
              fontSize={12}
              fontFamily={fonts.semibold}
              fill={colors.text}
              textAnchor="middle"
            >
              Readings in the order taken
            </SvgText>
          </Svg>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { paddingTop: space.sm } });
