import { StyleSheet, View } from 'react-native';

import { Badge, Text } from '@/components/ui';
import { useUnitSystem } from '@/lib/api/session';
import type { Finding } from '@/lib/chemistry/carbonation';
import { space } from '@/lib/theme';
import { inUnits } from '@/lib/units';

import { LEVEL_LABEL, LEVEL_TONE } from '../review-tone';

const ORDER: Record<Finding['level'], number> = { danger: 0, caution: 1, ok: 2 };

/** The engine's findings, most serious first, each with its level in words as well as colour, in the person's units. */
export function FindingList({ findings }: { findings: Finding[] }) {
  const units = useUnitSystem();
  const sorted = [...findings].sort((a, b) => ORDER[a.level] - ORDER[b.level]);
  return (
    <View role="list" aria-label="Findings" style={styles.list}>
      {sorted.map((finding) => (
        <View
          role="listitem"
          key={finding.code}
          style={styles.item}
          aria-label={`${LEVEL_LABEL[finding.level]}: ${inUnits(finding.message, units)}`}
        >
          <Badge label={LEVEL_LABEL[finding.level]} tone={LEVEL_TONE[finding.level]} />
          <Text style={styles.message}>{inUnits(finding.message, units)}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start' },
  message: { flex: 1 },
});
