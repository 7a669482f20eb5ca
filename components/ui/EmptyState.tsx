import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { colors, radius, space } from '@/lib/theme';

import { Text } from './Text';

/** What a list shows when it has nothing yet: what belongs here and how to add it. */
export function EmptyState({ title, message, action }: { title: string; message?: string; action?: ReactNode }) {
  return (
    <View style={styles.box}>
      <Text variant="subheading">{title}</Text>
      {message ? (
        <Text variant="muted" style={styles.center}>
          {message}
        </Text>
      ) : null}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: space.sm,
    padding: space.xl,
    borderRadius: radius.lg,
    borderWidth: 1.5,
    borderStyle: 'dashed',
    borderColor: colors.border,
  },
  center: { textAlign: 'center' },
});
