import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { colors, fonts, fontSize, radius, selection, space, touchTarget } from '@/lib/theme';

import { Text } from './Text';

interface Props<T extends string> {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  /** Show the label above the control (default) or keep it for screen readers only. */
  showLabel?: boolean;
}

/** A few short choices side by side, one tap each; on a narrow screen they wrap. */
export function Segmented<T extends string>({ label, value, options, onChange, showLabel = true }: Props<T>) {
  return (
    <View style={styles.field}>
      {showLabel ? <Text variant="label">{label}</Text> : null}
      <View role="radiogroup" aria-label={label} style={styles.group}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={option.value}
              role="radio"
              aria-checked={selected}
              aria-label={option.label}
              onPress={() => onChange(option.value)}
              style={(state) => {
                const { focused } = state as typeof state & { focused?: boolean };
                return [styles.option, selected && styles.selected, focused && styles.focused];
              }}
            >
              <Text style={[styles.text, selected && styles.textSelected]}>{option.label}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  group: {
    flexDirection: 'row',
    borderWidth: 1.5,
    borderColor: colors.primary,
    borderRadius: radius.md,
    overflow: 'hidden',
    alignSelf: 'flex-start',
    // More choices than a phone's width holds wrap to a second row rather than running off the screen.
    flexWrap: 'wrap',
  },
  option: {
    flexGrow: 1,
    alignItems: 'center',
    minHeight: touchTarget,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  selected: selection.box,
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: -3 } as ViewStyle,
  text: { fontFamily: fonts.semibold, fontSize: fontSize.sm, color: colors.primary },
  textSelected: selection.text,
});
