import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';

import { Logo } from '@/components/ui/Logo';
import { Text } from '@/components/ui/Text';
import { breakpoints, colors, fonts, fontSize, radius, space } from '@/lib/theme';

/**
 * The frame of the signed-out pages: the form on a card, and on wide windows a panel saying what
 * Fizzwright is for.
 */
export function AuthFrame({ children }: { children: ReactNode }) {
  const { width } = useWindowDimensions();
  const wide = width >= breakpoints.wide;
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={[styles.content, wide && styles.contentWide]}
      keyboardShouldPersistTaps="handled"
    >
      {wide ? (
        <View style={styles.panel}>
          <Logo inverse size={40} />
          <Text style={styles.panelTitle}>Flavour, fizz and safety for bottle-conditioned drinks.</Text>
          <Text style={styles.panelText}>
            Design a flavour, see the sugar, CO2, bottle pressure and alcohol before anything is sealed, and send
            approved recipes to the floor.
          </Text>
        </View>
      ) : (
        <View style={styles.phoneLogo}>
          <Logo size={34} />
        </View>
      )}
      <View role="main" style={[styles.card, wide && styles.cardWide]}>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  content: { flexGrow: 1, padding: space.lg, alignItems: 'center', gap: space.lg, paddingTop: space.xxl },
  contentWide: { flexDirection: 'row', justifyContent: 'center', alignItems: 'center', gap: space.xxl * 2 },
  phoneLogo: { alignSelf: 'center' },
  panel: { width: 380, backgroundColor: colors.rail, borderRadius: radius.lg, padding: space.xxl, gap: space.lg },
  panelTitle: { color: colors.railText, fontSize: fontSize.display, lineHeight: 32, fontFamily: fonts.bold },
  panelText: { color: colors.panelText },
  card: {
    width: '100%',
    maxWidth: 460,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.hairline,
    padding: space.xl,
    gap: space.lg,
  },
  cardWide: { padding: space.xxl },
});
