import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { colors, space } from '@/lib/theme';

import { Text } from './Text';

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <View style={styles.box} role="status" aria-label={label}>
      <ActivityIndicator color={colors.primary} />
      <Text variant="muted">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
    padding: space.xl,
    backgroundColor: colors.background,
  },
});
