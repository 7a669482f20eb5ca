import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import type { PrimingResult } from '@/lib/chemistry/carbonation';
import { colors, fonts, space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

interface Props {
  bands: PrimingResult['bands'];
  /** The sugar for the target, and the most that is safe, grams per bottle. */
  targetG: number;
  safeG: number;
  limitPercent: number;
  sugarName: string;
}

/**
 * Where an amount of sugar sits for this bottle: a rule of grams from 0 shaded safe, caution (from 75 % of the
 * rating) and danger (from the rating), with the alcohol limit and the amount for the target marked on it.
 * Every band and mark is said in words below it as well.
 */
export function SugarBands({ bands, targetG, safeG, limitPercent, sugarName }: Props) {
  const end = Math.max(targetG, bands.dangerFromG ?? 0, bands.alcoholLimitG) * 1.15 || 1;
  const at = (g: number) => `${Math.min(100, (g / end) * 100)}%` as const;
  const caution = bands.cautionFromG ?? end;
  const danger = bands.dangerFromG ?? end;
  const g = (v: number) => `${formatNumber(v, 2)} g`;
  return (
    <View style={styles.wrap}>
      <View style={styles.rule} aria-hidden>
        <View style={[styles.band, { left: 0, width: at(caution), backgroundColor: colors.successTint }]} />
        <View
          style={[styles.band, { left: at(caution), width: at(danger - caution), backgroundColor: colors.cautionTint }]}
        />
        <View style={[styles.band, { left: at(danger), right: 0, backgroundColor: colors.dangerTint }]} />
        <View style={[styles.limit, { left: at(bands.alcoholLimitG) }]} />
        <View style={[styles.marker, { left: at(targetG) }]} />
        {safeG < targetG ? <View style={[styles.marker, styles.safeMarker, { left: at(safeG) }]} /> : null}
      </View>
      <View style={styles.scale} aria-hidden>
        <Text variant="small">0 g</Text>
        <Text variant="small">{g(end)}</Text>
      </View>
      <Text variant="small">
        <Text style={styles.key}>▼ {g(targetG)}</Text> of {sugarName} for the target
        {safeG < targetG ? `; ▽ ${g(safeG)} is the most that is safe` : ''}.
        {bands.cautionFromG !== null && bands.dangerFromG !== null
          ? ` Safe up to ${g(bands.cautionFromG)}, caution from there (within 25 % of the rating on the warmest day), danger from ${g(bands.dangerFromG)} (at the rating).`
          : ' No bottle rating: choose a bottle format to see the bands.'}{' '}
        The dark line is the {formatNumber(limitPercent, 1)} % ABV limit, at {g(bands.alcoholLimitG)}.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  rule: {
    height: 28,
    borderRadius: 6,
    overflow: 'hidden',
    borderWidth: 1,
    borderColor: colors.border,
    position: 'relative',
  },
  band: { position: 'absolute', top: 0, bottom: 0 },
  limit: { position: 'absolute', top: 0, bottom: 0, width: 3, marginLeft: -1.5, backgroundColor: colors.text },
  marker: {
    position: 'absolute',
    top: 2,
    width: 0,
    height: 0,
    marginLeft: -8,
    borderLeftWidth: 8,
    borderRightWidth: 8,
    borderTopWidth: 14,
    borderLeftColor: 'transparent',
    borderRightColor: 'transparent',
    borderTopColor: colors.primary,
  },
  safeMarker: { borderTopColor: colors.success },
  scale: { flexDirection: 'row', justifyContent: 'space-between' },
  key: { fontFamily: fonts.semibold },
});
