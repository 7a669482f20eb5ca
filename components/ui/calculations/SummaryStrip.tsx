import { StyleSheet, View } from 'react-native';

import { Badge, Text } from '@/components/ui';
import type { CarbonationResult } from '@/lib/chemistry/carbonation';
import { colors, fontSize, radius, space } from '@/lib/theme';
import { formatNumber, formatPressure, formatTemp, type UnitSystem } from '@/lib/units';

/**
 * The key numbers in one line, kept at the top of the screen on phones, where the results come after the inputs:
 * worst-case volumes, pressure at the hottest temperature, alcohol, and the most serious finding.
 */
export function SummaryStrip({ result, units }: { result: CarbonationResult; units: UnitSystem }) {
  const worst = result.cases.worst;
  const temps = result.pressures.map((p) => p.tempC);
  const hottest = temps.indexOf(Math.max(...temps));
  const level = result.findings.some((f) => f.level === 'danger')
    ? 'danger'
    : result.findings.some((f) => f.level === 'caution')
      ? 'caution'
      : 'success';
  return (
    <View style={styles.strip} role="status" aria-live="polite">
      <Badge label={level === 'danger' ? 'Danger' : level === 'caution' ? 'Caution' : 'OK'} tone={level} />
      <Text style={styles.text}>
        {formatNumber(worst.co2.totalVolumes, 2)} vol ·{' '}
        {result.pressures[hottest]?.liquidFills ? 'bottle full' : formatPressure(worst.gaugeBar[hottest], units)} at{' '}
        {formatTemp(temps[hottest], units)} · {formatNumber(worst.alcohol.totalAbvPercent, 2)} % ABV
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  strip: {
    position: 'sticky' as never,
    top: 0,
    zIndex: 2,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    padding: space.sm,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.border,
  },
  text: { flex: 1, fontSize: fontSize.sm, lineHeight: 20 },
});
