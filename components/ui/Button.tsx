import {
  ActivityIndicator,
  Pressable,
  type PressableProps,
  type StyleProp,
  StyleSheet,
  View,
  type ViewStyle,
} from 'react-native';

import { colors, fonts, fontSize, radius, space, touchTarget } from '@/lib/theme';

import { Text } from './Text';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

interface Props extends Omit<PressableProps, 'style' | 'children'> {
  label: string;
  variant?: Variant;
  busy?: boolean;
  style?: StyleProp<ViewStyle>;
  /** Stretch to the width of the container (forms on phones). */
  block?: boolean;
  /** A fuller name for screen readers when the visible label is short ("Resend" → "Resend to ana@..."). */
  accessibleName?: string;
}

/** The one button. At least 44 px tall, with a visible focus ring for keyboard users. */
export function Button({
  label,
  variant = 'primary',
  busy = false,
  disabled,
  block,
  style,
  accessibleName,
  ...rest
}: Props) {
  const inactive = disabled || busy;
  return (
    <Pressable
      role="button"
      aria-label={accessibleName ?? label}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      {...rest}
      style={(state) => {
        const { pressed, focused, hovered } = state as typeof state & { focused?: boolean; hovered?: boolean };
        return [
          styles.base,
          styles[variant],
          block && styles.block,
          (pressed || hovered) && !inactive && pressedStyles[variant],
          focused && styles.focused,
          inactive && styles.inactive,
          style,
        ];
      }}
    >
      <View style={styles.content}>
        {busy ? (
          <ActivityIndicator
            size="small"
            color={variant === 'primary' || variant === 'danger' ? colors.textOnPrimary : colors.primary}
          />
        ) : null}
        <Text style={[styles.label, labelStyles[variant]]}>{label}</Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: 'transparent',
    justifyContent: 'center',
    alignItems: 'center',
  },
  block: { alignSelf: 'stretch' },
  content: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  primary: { backgroundColor: colors.primary },
  secondary: { backgroundColor: colors.surface, borderColor: colors.primary },
  danger: { backgroundColor: colors.danger },
  quiet: { backgroundColor: 'transparent' },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as ViewStyle,
  inactive: { opacity: 0.55 },
  label: { fontFamily: fonts.semibold, fontSize: fontSize.md },
});

const pressedStyles = StyleSheet.create({
  primary: { backgroundColor: colors.primaryPressed },
  secondary: { backgroundColor: colors.surfaceMuted },
  danger: { backgroundColor: colors.dangerStrong },
  quiet: { backgroundColor: colors.surfaceMuted },
});

const labelStyles = StyleSheet.create({
  primary: { color: colors.textOnPrimary },
  secondary: { color: colors.primary },
  danger: { color: colors.textOnPrimary },
  quiet: { color: colors.primary, textDecorationLine: 'underline' },
});
