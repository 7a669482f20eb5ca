import { StyleSheet, View } from 'react-native';

import { colors, fonts } from '@/lib/theme';

import { LogoMark } from './LogoMark';
import { Text } from './Text';

/** The mark with the name beside it. */
export function Logo({ inverse = false, size = 32 }: { inverse?: boolean; size?: number }) {
  return (
    <View style={styles.row} aria-label="Fizzwright">
      <LogoMark size={size} inverse={inverse} />
      <Text style={[styles.word, { color: inverse ? colors.railText : colors.primary, fontSize: size * 0.7 }]}>
        Fizzwright
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: 8 },
  word: { fontFamily: fonts.bold, letterSpacing: 0.3 },
});
