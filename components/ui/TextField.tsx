import { forwardRef, useId, useState } from 'react';
import { StyleSheet, TextInput, type TextInputProps, View, type ViewStyle } from 'react-native';

import { colors, fonts, fontSize, radius, space, touchTarget } from '@/lib/theme';

import { Text } from './Text';

export interface TextFieldProps extends Omit<TextInputProps, 'style'> {
  label: string;
  hint?: string;
  error?: string;
  /** Text shown after the input, such as a unit. */
  suffix?: string;
}

/** A labelled text input with its hint and error message, tied together for screen readers. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, hint, error, suffix, onFocus, onBlur, ...rest },
  ref,
) {
  const [focused, setFocused] = useState(false);
  const id = useId();
  const messageId = `${id}-message`;
  return (
    <View style={styles.field}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      <View style={[styles.box, focused && styles.boxFocused, error ? styles.boxError : null]}>
        <TextInput
          ref={ref}
          aria-label={label}
          aria-invalid={Boolean(error)}
          aria-describedby={error || hint ? messageId : undefined}
          placeholderTextColor={colors.textMuted}
          onFocus={(event) => {
            setFocused(true);
            onFocus?.(event);
          }}
          onBlur={(event) => {
            setFocused(false);
            onBlur?.(event);
          }}
          style={styles.input}
          {...rest}
        />
        {suffix ? <Text style={styles.suffix}>{suffix}</Text> : null}
      </View>
      {error ? (
        <Text nativeID={messageId} role="alert" style={styles.error}>
          {error}
        </Text>
      ) : hint ? (
        <Text nativeID={messageId} variant="small">
          {hint}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  field: { gap: space.xs, alignSelf: 'stretch' },
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: touchTarget,
    borderWidth: 1.5,
    borderColor: colors.border,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  boxFocused: {
    borderColor: colors.primary,
    outlineColor: colors.focus,
    outlineWidth: 2,
    outlineStyle: 'solid',
  } as ViewStyle,
  boxError: { borderColor: colors.danger },
  input: {
    flex: 1,
    // Without this a web input keeps its intrinsic width and pushes the unit out of the box.
    minWidth: 0,
    minHeight: touchTarget - 3,
    paddingHorizontal: space.md,
    fontFamily: fonts.regular,
    fontSize: fontSize.md,
    color: colors.text,
    // The box draws the focus ring; the browser's own ring on the bare input would double it.
    outlineWidth: 0,
  },
  suffix: { paddingRight: space.md, color: colors.textMuted },
  error: { color: colors.danger, fontSize: fontSize.sm, lineHeight: 20, fontFamily: fonts.semibold },
});
