import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { type BasisKey, basisOf, DV_FOOTNOTE, type NutritionAnswer, panelLines } from '@/lib/nutrition/panel';
import { colors, fonts, space } from '@/lib/theme';

interface Props {
  answer: NutritionAnswer;
  basis: BasisKey;
  /** What this panel is, for screen readers ("Nutrition Facts, as formulated"). */
  label: string;
}

/**
 * The panel on screen in the format of 21 CFR 101.9(d), black on white: title, servings and serving size, a heavy
 * bar, calories large, nutrients between hairlines with %DV on the right, vitamins and minerals below a heavy bar,
 * the footnote. Two columns (per serving, per container) where the container is 200 % to 300 % of a serving.
 */
export function NutritionFactsPanel({ answer, basis, label }: Props) {
  const { basis: b, perContainer } = basisOf(answer, basis);
  const dual = perContainer !== undefined;
  const lines = panelLines(b, perContainer);
  return (
    <View style={[styles.panel, dual ? styles.dual : styles.single]} role="group" aria-label={label}>
      <Text style={styles.title}>Nutrition Facts</Text>
      <View style={styles.hair} />
      <Text style={styles.ink}>{answer.serving.servingsText}</Text>
      <View style={styles.row}>
        <Text style={[styles.ink, styles.bold, styles.serving]}>Serving size</Text>
        <Text style={[styles.ink, styles.bold, styles.serving]}>
          {answer.serving.household} ({answer.serving.metric})
        </Text>
      </View>
      <View style={styles.heavy} />
      {dual ? (
        <View style={styles.row}>
          <View style={styles.name} />
          <Text style={[styles.ink, styles.bold, styles.small, styles.column]}>Per serving</Text>
          <Text style={[styles.ink, styles.bold, styles.small, styles.column]}>Per container</Text>
        </View>
      ) : (
        <Text style={[styles.ink, styles.bold, styles.small]}>Amount per serving</Text>
      )}
      <View style={styles.row}>
        <Text style={[styles.ink, styles.calories, styles.name]}>Calories</Text>
        <Text style={[styles.ink, styles.caloriesValue, dual && styles.column]}>{b.label.calories}</Text>
        {dual ? (
          <Text style={[styles.ink, styles.caloriesValue, styles.column]}>{perContainer.label.calories}</Text>
        ) : null}
      </View>
      <View style={styles.medium} />
      <Text style={[styles.ink, styles.bold, styles.small, styles.right]}>% Daily Value*</Text>
      {lines.map((line) => (
        <View key={line.nutrient}>
          <View style={line.thickRuleAbove ? styles.heavy : styles.hair} />
          <View style={styles.row}>
            <Text style={[styles.ink, styles.name, { paddingLeft: line.indent * space.lg }]}>
              {dual && line.nutrient === 'addedSugars' ? (
                'Incl. Added Sugars'
              ) : (
                <>
                  <Text style={[styles.ink, line.bold && styles.bold]}>{line.name}</Text>
                  {!dual && line.amount ? ` ${line.amount}` : ''}
                </>
              )}
            </Text>
            {dual ? (
              <>
                <Amount amount={line.nutrient === 'addedSugars' ? b.label.addedSugars : line.amount} dv={line.dv} />
                <Amount
                  amount={line.nutrient === 'addedSugars' ? perContainer.label.addedSugars : line.perContainer!.amount}
                  dv={line.perContainer!.dv}
                />
              </>
            ) : (
              <Text style={[styles.ink, styles.bold]}>{line.dv ?? ''}</Text>
            )}
          </View>
        </View>
      ))}
      <View style={styles.medium} />
      <Text style={[styles.ink, styles.footnote]}>{DV_FOOTNOTE}</Text>
    </View>
  );
}

function Amount({ amount, dv }: { amount: string; dv: string | null }) {
  return (
    <View style={[styles.column, styles.amount]}>
      <Text style={styles.ink}>{amount}</Text>
      <Text style={[styles.ink, styles.bold]}>{dv ?? ''}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    backgroundColor: colors.labelPaper,
    borderWidth: 1,
    borderColor: colors.labelInk,
    padding: space.sm,
    alignSelf: 'flex-start',
    width: '100%',
  },
  single: { maxWidth: 340 },
  dual: { maxWidth: 520 },
  ink: { color: colors.labelInk, fontSize: 15, lineHeight: 22 },
  bold: { fontFamily: fonts.bold },
  small: { fontSize: 13, lineHeight: 18 },
  title: { color: colors.labelInk, fontFamily: fonts.bold, fontSize: 34, lineHeight: 38 },
  serving: { fontSize: 17 },
  calories: { fontFamily: fonts.bold, fontSize: 24, lineHeight: 32 },
  caloriesValue: { color: colors.labelInk, fontFamily: fonts.bold, fontSize: 32, lineHeight: 36, textAlign: 'right' },
  row: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  name: { flex: 1 },
  column: { width: 130, textAlign: 'right' },
  amount: { flexDirection: 'row', justifyContent: 'space-between', gap: space.xs },
  right: { textAlign: 'right' },
  footnote: { fontSize: 12, lineHeight: 16, marginTop: space.xs },
  hair: { height: 1, backgroundColor: colors.labelInk, marginVertical: 2 },
  medium: { height: 5, backgroundColor: colors.labelInk, marginVertical: 2 },
  heavy: { height: 10, backgroundColor: colors.labelInk, marginVertical: 2 },
});
