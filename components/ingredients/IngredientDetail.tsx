import { StyleSheet, View } from 'react-native';

import { Badge, Card, type Column, Table, Text } from '@/components/ui';
import { type Ingredient, useIngredientChangesQuery } from '@/lib/api/ingredients';
import { useBreweryCurrency } from '@/lib/api/session';
import { formatDateTime, formatMoney } from '@/lib/format';
import { ALLERGEN_LABELS, CATEGORY_LABELS, LABEL_NUTRIENT_FIELD_INFO, LABEL_NUTRIENT_FIELDS } from '@/lib/ingredients';
import { space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

import { Attachments } from './Attachments';
import { DisplayNameForm } from './DisplayNameForm';

const value = (v: number | null, unit: string, digits = 1) =>
  v === null ? 'not measured' : `${formatNumber(v, digits)} ${unit}`;

interface MeasureRow {
  label: string;
  grams: number;
}

/** Everything known about one ingredient: per 100 g, per household measure, its sugar, allergens, source, changes. */
export function IngredientDetail({ ingredient, canEdit }: { ingredient: Ingredient; canEdit: boolean }) {
  const changes = useIngredientChangesQuery(ingredient.id, ingredient.scope === 'house');
  const currency = useBreweryCurrency();
  const sugarPerG = ingredient.perGram.sugarsG;
  const measureColumns: Column<MeasureRow>[] = [
    { key: 'measure', header: 'Measure', flex: 2, render: (m) => m.label },
    { key: 'weight', header: 'Weighs', render: (m) => `${formatNumber(m.grams, 1)} g` },
    {
      key: 'sugar',
      header: 'Sugars',
      render: (m) => (sugarPerG === null ? 'not measured' : `${formatNumber(m.grams * sugarPerG, 2)} g`),
    },
  ];
  const p = ingredient.per100g;
  return (
    <View style={styles.wrap}>
      <View style={styles.badges}>
        <Badge label={CATEGORY_LABELS[ingredient.category]} tone="info" />
        <Badge
          label={ingredient.scope === 'house' ? 'House ingredient' : 'Dataset (read-only)'}
          tone={ingredient.scope === 'house' ? 'success' : 'neutral'}
        />
        {ingredient.archived ? <Badge label="Archived" tone="caution" /> : null}
      </View>
      {ingredient.scope === 'dataset' ? <DisplayNameForm ingredient={ingredient} canEdit={canEdit} /> : null}
      <View style={styles.grid}>
        <Card title="Sugar" style={styles.card}>
          <Text variant="subheading">
            {value(sugarPerG === null ? null : sugarPerG * 100, 'g of sugars per 100 g', 2)}
          </Text>
          <Text variant="muted">
            {formatNumber(ingredient.fermentableSharePct, 0)} % of it yeast can ferment
            {ingredient.perGram.fermentableSugarsG !== null
              ? ` (${formatNumber(ingredient.perGram.fermentableSugarsG * 100, 2)} g per 100 g)`
              : ''}
            . About {formatNumber(ingredient.steepSharePct, 0)} % reaches the liquid when steeped and strained.
          </Text>
        </Card>
        <Card title="Per 100 g" style={styles.card}>
          <Text>Energy: {value(p.energyKcal, 'kcal', 0)}</Text>
          <Text>Carbohydrate: {value(p.carbohydrateG, 'g', 2)}</Text>
          <Text>Total sugars: {value(p.sugarsG, 'g', 2)}</Text>
          <Text>Fibre: {value(p.fibreG, 'g', 1)}</Text>
          <Text>Fat: {value(p.fatG, 'g', 2)}</Text>
          <Text>Protein: {value(p.proteinG, 'g', 2)}</Text>
          {LABEL_NUTRIENT_FIELDS.map((field) => (
            <Text key={field}>
              {LABEL_NUTRIENT_FIELD_INFO[field].label}:{' '}
              {value(ingredient.labelPer100g[field], LABEL_NUTRIENT_FIELD_INFO[field].unit, 2)}
            </Text>
          ))}
        </Card>
        <Card title="Allergens and source" style={styles.card}>
          {ingredient.allergens.length > 0 ? (
            <View style={styles.badges}>
              {ingredient.allergens.map((a) => (
                <Badge key={a} label={ALLERGEN_LABELS[a]} tone="caution" />
              ))}
            </View>
          ) : (
            <Text variant="muted">None of the US major food allergens recorded. Check the supplier’s label.</Text>
          )}
          <Text variant="small">Source: {ingredient.source}</Text>
          {ingredient.costPerKg !== null ? (
            <Text variant="small">Cost: {formatMoney(ingredient.costPerKg, currency)} per kg</Text>
          ) : null}
          {ingredient.notes ? <Text variant="small">{ingredient.notes}</Text> : null}
        </Card>
      </View>
      {ingredient.measures.length > 0 ? (
        <Card title="Household measures">
          <Table
            label="Household measures"
            columns={measureColumns}
            rows={ingredient.measures}
            rowKey={(m) => m.label}
          />
        </Card>
      ) : null}
      {ingredient.scope === 'house' ? <Attachments ingredientId={ingredient.id} canUpload={canEdit} /> : null}
      {ingredient.scope === 'house' ? (
        <Card title="Changes">
          {changes.data?.map((c) => (
            <Text key={c.id} variant="small">
              {formatDateTime(c.at)} ·{c.by ?? 'someone'} · {c.action}
              {c.action === 'updated' ? `: ${Object.keys(c.changes).join(', ')}` : ''}
            </Text>
          ))}
        </Card>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: 280 },
});
