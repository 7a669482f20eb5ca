import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { colors, fonts, fontSize, radius, selection, space, touchTarget } from '@/lib/theme';

import { Text } from './Text';

export interface SelectOption<T extends string> {
  value: T;
  label: string;
  description?: string;
}

interface Props<T extends string> {
  label: string;
  value: T | undefined;
  options: readonly SelectOption<T>[];
  onChange: (value: T) => void;
  error?: string;
  disabled?: boolean;
  /** Small chips that only take the room their label needs (for longer lists of short labels). */
  compact?: boolean;
}

/** A choice among a few options, shown all at once as a radio group: one tap on a phone, no hidden menu. */
export function Select<T extends string>({
  label,
  value,
  options,
  onChange,
  error,
  disabled,
  compact = false,
}: Props<T>) {
  return (
    <View style={styles.field}>
      <Text variant="label">{label}</Text>
      <View role="radiogroup" aria-label={label} style={styles.options}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              role="radio"
              aria-checked={selected}
              aria-label={option.label}
              disabled={disabled}
              onPress={() => onChange(option.value)}
              style={(state) => {
                const { focused } = state as typeof state & { focused?: boolean };
                return [
                  styles.option,
                  compact && styles.compact,
                  selected && styles.selected,
                  focused && styles.focused,
                  disabled && styles.disabled,
                ];
              }}
            >
              {compact ? null : <View style={[styles.dot, selected && styles.dotSelected]} />}
              <View style={styles.optionText}>
                <Text style={[styles.optionLabel, selected && styles.optionLabelSelected]}>{option.label}</Text>
                {option.description ? <Text variant="small">{option.description}</Text> : null}
              </View>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <Text role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, alignSelf: 'stretch' },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    minHeight: touchTarget,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderWidth: 1.5,
    borderColor: colors.border,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    flexGrow: 1,
    flexBasis: 140,
  },
  compact: { flexGrow: 0, flexBasis: 'auto', paddingHorizontal: space.md },
  selected: selection.box,
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 1 } as ViewStyle,
  disabled: { opacity: 0.55 },
  dot: { width: 18, height: 18, borderRadius: 9, borderWidth: 2, borderColor: colors.textMuted },
  dotSelected: {
    borderColor: colors.textOnPrimary,
    backgroundColor: colors.textOnPrimary,
    boxShadow: `inset 0 0 0 3px ${colors.primary}`,
  } as ViewStyle,
  optionText: { flexShrink: 1 },
  optionLabel: { fontFamily: fonts.semibold, fontSize: fontSize.md },
  optionLabelSelected: selection.text,
  error: { color: colors.danger, fontSize: fontSize.sm, fontFamily: fonts.semibold },
});
