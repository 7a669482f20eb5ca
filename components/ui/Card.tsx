import type { ReactNode } from 'react';
import { type StyleProp, StyleSheet, View, type ViewStyle } from 'react-native';

import { colors, radius, space } from '@/lib/theme';

import { Text } from './Text';

interface Props {
  title?: string;
  /** Short text beside the title, such as a count. */
  aside?: ReactNode;
  children: ReactNode;
  style?: StyleProp<ViewStyle>;
}

export function Card({ title, aside, children, style }: Props) {
  return (
    <View style={[styles.card, style]}>
      {title ? (
        <View style={styles.header}>
          <Text variant="subheading" level={2}>
            {title}
          </Text>
          {typeof aside === 'string' || typeof aside === 'number' ? <Text variant="muted">{aside}</Text> : aside}
        </View>
      ) : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.hairline,
    padding: space.lg,
    gap: space.md,
  },
  header: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'center',
    gap: space.sm,
    flexWrap: 'wrap',
  },
});
