import { Formik } from 'formik';
import { Pressable, StyleSheet, View, type ViewStyle } from 'react-native';

import { Button, FormField, FormNumberField, FormStatus, Segmented, Select, submitTo, Text } from '@/components/ui';
import type { Ingredient } from '@/lib/api/ingredients';
import { check, parseNumber } from '@/lib/forms';
import {
  type Allergen,
  ALLERGEN_LABELS,
  ALLERGENS,
  CATEGORIES,
  type Category,
  CATEGORY_LABELS,
  DEFAULT_FERMENTABLE_SHARE,
  DEFAULT_STEEP_SHARE,
  LABEL_NUTRIENT_FIELD_INFO,
  LABEL_NUTRIENT_FIELDS,
  type LabelNutrientField,
} from '@/lib/ingredients';
import { type HouseIngredientInput, houseIngredientSchema, per100g } from '@/lib/schemas/ingredients';
import { colors, fonts, radius, selection, space, touchTarget } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

type Values = Record<LabelNutrientField, string> & {
  name: string;
  category: Category;
  servingSize: string;
  servingUnit: 'g' | 'ml';
  servingGrams: string;
  energyKcal: string;
  carbohydrateG: string;
  sugarsG: string;
  fibreG: string;
  fatG: string;
  proteinG: string;
  fermentableSharePct: string;
  steepSharePct: string;
  allergens: Allergen[];
  costPerKg: string;
  notes: string;
};

const text = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(Number(v.toPrecision(8))));

/** An existing ingredient as a label with a 100 g serving, so its values read as they are stored. */
function toValues(i?: Ingredient): Values {
  const category = i?.category ?? 'puree';
  return {
    name: i?.name ?? '',
    category,
    servingSize: i ? '100' : '',
    servingUnit: 'g',
    servingGrams: '',
    energyKcal: text(i?.per100g.energyKcal),
    carbohydrateG: text(i?.per100g.carbohydrateG),
    sugarsG: text(i?.per100g.sugarsG),
    fibreG: text(i?.per100g.fibreG),
    fatG: text(i?.per100g.fatG),
    proteinG: text(i?.per100g.proteinG),
    ...(Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, text(i?.labelPer100g[f])])) as Record<
      LabelNutrientField,
      string
    >),
    fermentableSharePct: text(i?.fermentableSharePct ?? DEFAULT_FERMENTABLE_SHARE[category] * 100),
    steepSharePct: text(i?.steepSharePct ?? DEFAULT_STEEP_SHARE[category] * 100),
    allergens: i?.allergens ?? [],
    costPerKg: text(i?.costPerKg),
    notes: i?.notes ?? '',
  };
}

const orNull = (t: string) => parseNumber(t) ?? null;
const toInput = (v: Values) => ({
  ...v,
  servingSize: parseNumber(v.servingSize),
  servingGrams: v.servingUnit === 'ml' ? parseNumber(v.servingGrams) : null,
  energyKcal: orNull(v.energyKcal),
  carbohydrateG: orNull(v.carbohydrateG),
  sugarsG: parseNumber(v.sugarsG),
  fibreG: orNull(v.fibreG),
  fatG: orNull(v.fatG),
  proteinG: orNull(v.proteinG),
  ...Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, orNull(v[f])])),
  fermentableSharePct: parseNumber(v.fermentableSharePct),
  steepSharePct: parseNumber(v.steepSharePct),
  costPerKg: orNull(v.costPerKg),
  notes: v.notes.trim() === '' ? null : v.notes,
});

interface Props {
  ingredient?: Ingredient;
  submitLabel: string;
  onSubmit: (input: HouseIngredientInput) => Promise<unknown>;
  error: unknown;
}

/** A house ingredient from its product label: values per serving, which are stored per 100 g. */
export function HouseIngredientForm({ ingredient, submitLabel, onSubmit, error }: Props) {
  return (
    <Formik<Values>
      initialValues={toValues(ingredient)}
      validate={(values) => check(houseIngredientSchema, toInput(values)).errors}
      onSubmit={submitTo((values: Values) => onSubmit(check(houseIngredientSchema, toInput(values)).value!))}
    >
      {({ values, setFieldValue, setValues, handleSubmit, isSubmitting, errors }) => {
        const grams = values.servingUnit === 'ml' ? parseNumber(values.servingGrams) : parseNumber(values.servingSize);
        const sugar = parseNumber(values.sugarsG);
        const preview =
          grams && sugar !== undefined && !Number.isNaN(sugar) && !Number.isNaN(grams) ? per100g(sugar, grams) : null;
        return (
          <View style={styles.form}>
            <FormStatus error={error} />
            <FormField name="name" label="Name" hint="As your team calls it, e.g. the supplier and product." />
            <Select
              compact
              label="Category"
              value={values.category}
              options={CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))}
              onChange={(category) =>
                setValues({
                  ...values,
                  category,
                  fermentableSharePct: String(DEFAULT_FERMENTABLE_SHARE[category] * 100),
                  steepSharePct: String(DEFAULT_STEEP_SHARE[category] * 100),
                })
              }
            />
            <Text variant="subheading" level={2}>
              From the label
            </Text>
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField
                  name="servingSize"
                  label="Serving size"
                  unit={values.servingUnit === 'ml' ? 'mL' : 'g'}
                />
              </View>
              <View style={styles.cell}>
                <Segmented
                  label="Serving in"
                  value={values.servingUnit}
                  onChange={(u) => setFieldValue('servingUnit', u)}
                  options={[
                    { value: 'g', label: 'grams' },
                    { value: 'ml', label: 'mL' },
                  ]}
                />
              </View>
              {values.servingUnit === 'ml' ? (
                <View style={styles.cell}>
                  <FormNumberField name="servingGrams" label="Grams per serving" unit="g" />
                </View>
              ) : null}
            </View>
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField name="sugarsG" label="Total sugars per serving" unit="g" />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="carbohydrateG" label="Carbohydrate per serving" unit="g" />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="energyKcal" label="Energy per serving" unit="kcal" />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="fibreG" label="Fibre per serving" unit="g" />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="fatG" label="Fat per serving" unit="g" />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="proteinG" label="Protein per serving" unit="g" />
              </View>
            </View>
            <Text variant="label">
              The rest of the label, for the nutrition panel (leave empty what it does not give)
            </Text>
            <View style={styles.row}>
              {LABEL_NUTRIENT_FIELDS.map((field) => (
                <View key={field} style={styles.cell}>
                  <FormNumberField
                    name={field}
                    label={`${LABEL_NUTRIENT_FIELD_INFO[field].label} per serving`}
                    unit={LABEL_NUTRIENT_FIELD_INFO[field].unit}
                  />
                </View>
              ))}
            </View>
            {preview !== null && !errors.sugarsG ? (
              <Text variant="muted">= {formatNumber(preview, 2)} g of sugars per 100 g</Text>
            ) : null}
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField
                  name="fermentableSharePct"
                  label="Share of sugars yeast can ferment"
                  unit="%"
                  hint="100 % for fruit sugars and sucrose; 0 % for lactose."
                />
              </View>
              <View style={styles.cell}>
                <FormNumberField
                  name="steepSharePct"
                  label="Share reaching the liquid when steeped and strained"
                  unit="%"
                />
              </View>
              <View style={styles.cell}>
                <FormNumberField name="costPerKg" label="Cost per kg" hint="Optional, in your currency." />
              </View>
            </View>
            <View style={styles.field}>
              <Text variant="label">Allergens (US major food allergens)</Text>
              <View role="group" aria-label="Allergens" style={styles.chips}>
                {ALLERGENS.map((allergen) => {
                  const on = values.allergens.includes(allergen);
                  return (
                    <Pressable
                      key={allergen}
                      role="checkbox"
                      aria-checked={on}
                      aria-label={ALLERGEN_LABELS[allergen]}
                      onPress={() =>
                        setFieldValue(
                          'allergens',
                          on ? values.allergens.filter((a) => a !== allergen) : [...values.allergens, allergen],
                        )
                      }
                      style={(state) => {
                        const { focused } = state as typeof state & { focused?: boolean };
                        return [styles.chip, on && styles.chipOn, focused && styles.focus];
                      }}
                    >
                      <Text style={[styles.chipText, on && styles.chipTextOn]}>{ALLERGEN_LABELS[allergen]}</Text>
                    </Pressable>
                  );
                })}
              </View>
            </View>
            <FormField name="notes" label="Notes" multiline />
            <Button label={submitLabel} busy={isSubmitting} onPress={() => handleSubmit()} style={styles.submit} />
          </View>
        );
      }}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  cell: { flexGrow: 1, flexBasis: 200 },
  field: { gap: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: touchTarget,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: radius.pill,
    borderWidth: 1.5,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  chipOn: selection.box,
  chipText: { fontFamily: fonts.semibold, color: colors.text },
  chipTextOn: selection.text,
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 1 } as ViewStyle,
  submit: { alignSelf: 'flex-start' },
});
