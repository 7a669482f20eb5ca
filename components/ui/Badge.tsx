import { StyleSheet, View } from 'react-native';

import { colors, fonts, fontSize, radius, space } from '@/lib/theme';

import { Text } from './Text';

export type Tone = 'neutral' | 'info' | 'success' | 'caution' | 'danger';

const toneColors: Record<Tone, { bg: string; fg: string }> = {
  neutral: { bg: colors.surfaceMuted, fg: colors.text },
  info: { bg: colors.infoTint, fg: colors.info },
  success: { bg: colors.successTint, fg: colors.success },
  caution: { bg: colors.cautionTint, fg: colors.caution },
  danger: { bg: colors.dangerTint, fg: colors.danger },
};

export function Badge({ label, tone = 'neutral' }: { label: string; tone?: Tone }) {
  const { bg, fg } = toneColors[tone];
  return (
    <View style={[styles.badge, { backgroundColor: bg }]}>
      <Text style={[styles.label, { color: fg }]}>{label}</Text>
    </View>
  );
}

export { toneColors };

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
  },
  label: { fontFamily: fonts.semibold, fontSize: fontSize.xs, lineHeight: 18 },
});
