import { StyleSheet, Text as RNText, type TextProps } from 'react-native';

import { colors, fonts, fontSize } from '@/lib/theme';

type Variant = 'body' | 'muted' | 'small' | 'label' | 'title' | 'heading' | 'subheading';

interface Props extends TextProps {
  variant?: Variant;
  /** Renders a heading of this level for assistive technology (1 = page title). */
  level?: 1 | 2 | 3;
}

/** Text in the house typeface. Every piece of text in the app goes through here. */
export function Text({ variant = 'body', level, style, ...rest }: Props) {
  const headingProps = level ? ({ role: 'heading', 'aria-level': level } as const) : {};
  return <RNText {...headingProps} {...rest} style={[styles.base, styles[variant], style]} />;
}

const styles = StyleSheet.create({
  base: { fontFamily: fonts.regular, color: colors.text, fontSize: fontSize.md, lineHeight: 24 },
  body: {},
  muted: { color: colors.textMuted },
  small: { fontSize: fontSize.sm, lineHeight: 20, color: colors.textMuted },
  label: { fontFamily: fonts.semibold, fontSize: fontSize.sm, lineHeight: 20 },
  title: { fontFamily: fonts.bold, fontSize: fontSize.xxl, lineHeight: 36 },
  heading: { fontFamily: fonts.bold, fontSize: fontSize.xl, lineHeight: 30 },
  subheading: { fontFamily: fonts.semibold, fontSize: fontSize.lg, lineHeight: 26 },
});
