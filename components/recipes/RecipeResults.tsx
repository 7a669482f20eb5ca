import { StyleSheet, View } from 'react-native';

import { Badge, Card, Text } from '@/components/ui';
import { CarbonationResults } from '@/components/ui/calculations/CarbonationResults';
import type { RecipeEvaluation } from '@/lib/api/recipes';
import { useBreweryCurrency } from '@/lib/api/session';
import { formatMoney } from '@/lib/format';
import { ALLERGEN_LABELS } from '@/lib/ingredients';
import { space } from '@/lib/theme';
import { formatNumber, type UnitSystem } from '@/lib/units';

/** The live numbers beside the editor: the engine's answer for one bottle, allergens and cost. */
export function RecipeResults({
  evaluation,
  units,
  limitPercent,
  bottleName,
}: {
  evaluation: RecipeEvaluation;
  units: UnitSystem;
  limitPercent: number;
  bottleName: string;
}) {
  const currency = useBreweryCurrency();
  return (
    <View style={styles.wrap}>
      <Card title="Sugar in each bottle" aside={<Text variant="small">{bottleName}</Text>}>
        <Text>
          From the ingredients {formatNumber(evaluation.carbonation.sugar.fromIngredientsG, 2)} g · base and added sugar{' '}
          {formatNumber(evaluation.carbonation.sugar.addedG, 2)} g · fermentable{' '}
          {formatNumber(evaluation.carbonation.sugar.fermentableG, 2)} g (
          {formatNumber(evaluation.carbonation.sugar.fermentableGPerL, 1)} g/L)
          {evaluation.carbonation.sugar.sweetOnlyG > 0
            ? ` · ${formatNumber(evaluation.carbonation.sugar.sweetOnlyG, 2)} g sweetness only`
            : ''}
        </Text>
      </Card>
      <Card title="Allergens and cost" aside={<Text variant="small">per bottle of {bottleName}</Text>}>
        {evaluation.allergens.length > 0 ? (
          <View style={styles.badges}>
            {evaluation.allergens.map((a) => (
              <Badge key={a} label={ALLERGEN_LABELS[a]} tone="caution" />
            ))}
          </View>
        ) : (
          <Text variant="muted">No major allergens recorded for these ingredients.</Text>
        )}
        <Text>
          {evaluation.cost.perBottle === null
            ? `Cost unknown: no cost per kg for ${evaluation.cost.missing.join(', ')}.`
            : `Ingredients cost ${formatMoney(evaluation.cost.perBottle, currency, 3)} per bottle, ${formatMoney(evaluation.cost.perLitre ?? 0, currency)} per litre.`}
        </Text>
        {evaluation.lines.map((line) => (
          <Text key={line.ingredientId} variant="small">
            {line.name}: {formatNumber(line.gramsPerBottle, 2)} g per bottle, {formatNumber(line.sugarToLiquidG, 2)} g
            of sugar into the liquid
          </Text>
        ))}
      </Card>
      <CarbonationResults
        answer={{ ...evaluation.carbonation, bottleFormat: null }}
        chart={undefined}
        units={units}
        limitPercent={limitPercent}
        temperatureNames={evaluation.temperatureNames}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
