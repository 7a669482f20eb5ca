import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { colors, space } from '@/lib/theme';

import { Text } from './Text';

interface Props {
  title: string;
  subtitle?: string;
  /** Buttons beside the title. */
  actions?: ReactNode;
  children: ReactNode;
  /** Widest the content may grow, in px. Forms read best narrow; tables like room. */
  maxWidth?: number;
}

/** A scrolling page with its title as the page's one top-level heading. */
export function Screen({ title, subtitle, actions, children, maxWidth = 1120 }: Props) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.scrollContent} keyboardShouldPersistTaps="handled">
      <View role="main" style={[styles.inner, { maxWidth }]}>
        <View style={styles.titleRow}>
          <View style={styles.titleText}>
            <Text variant="title" level={1}>
              {title}
            </Text>
            {subtitle ? <Text variant="muted">{subtitle}</Text> : null}
          </View>
          {actions ? <View style={styles.actions}>{actions}</View> : null}
        </View>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  scrollContent: { padding: space.lg, paddingBottom: space.xxl * 2 },
  inner: { width: '100%', alignSelf: 'center', gap: space.lg },
  titleRow: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: space.md,
  },
  titleText: { flexShrink: 1, gap: space.xxs },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
