import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Path, Rect } from 'react-native-svg';

import { colors, fonts } from '@/lib/theme';

import { Text } from './Text';

/**
 * Fizzwright's mark: a squat swing-top bottle drawn as one green shape, three bubbles rising through an amber
 * band (the flavour), and the cap wire as a single stroke.
 */
export function LogoMark({ size = 36, inverse = false }: { size?: number; inverse?: boolean }) {
  const body = inverse ? colors.railText : colors.primary;
  const hole = inverse ? colors.rail : colors.background;
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 48 48"
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    >
      <Path d="M19 4h10v8c6 3 9 8 9 14v14a4 4 0 0 1-4 4H14a4 4 0 0 1-4-4V26c0-6 3-11 9-14V4z" fill={body} />
      <Rect x="10" y="27" width="28" height="7" fill={colors.brand} />
      <Circle cx="20" cy="38" r="2.2" fill={hole} />
      <Circle cx="27" cy="31" r="1.8" fill={hole} />
      <Circle cx="22" cy="22" r="1.4" fill={hole} />
      <Path d="M17 6c-3 0-4 3-2 5" stroke={body} strokeWidth="2" fill="none" strokeLinecap="round" />
    </Svg>
  );
}

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
