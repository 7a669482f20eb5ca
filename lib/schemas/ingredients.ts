import * as yup from 'yup';

import {
  type Allergen,
  ALLERGENS,
  CATEGORIES,
  type Category,
  LABEL_NUTRIENT_FIELD_INFO,
  LABEL_NUTRIENT_FIELDS,
  type LabelNutrientField,
} from '@/lib/ingredients';

import { numberField } from './numbers';

const perServing = (label: string) => numberField(label, { min: 0, max: 100000, unit: 'g' }).nullable().default(null);

/** The label's other nutrients per serving (optional; the nutrition panel notes what is missing). */
const labelNutrientFields = () =>
  Object.fromEntries(
    LABEL_NUTRIENT_FIELDS.map((field) => {
      const { label, unit } = LABEL_NUTRIENT_FIELD_INFO[field];
      return [
        field,
        numberField(label, { min: 0, max: unit === 'g' ? 100000 : 10000000, unit })
          .nullable()
          .default(null),
      ];
    }),
  ) as Record<LabelNutrientField, ReturnType<typeof perServing>>;

const ingredientName = () =>
  yup
    .string()
    .trim()
    .min(2, 'Name the ingredient (at least 2 characters).')
    .max(200, 'Keep the name under 200 characters.')
    .required('Name the ingredient.');

/**
 * A house ingredient as a person enters it: the values printed on the product label for one serving, which the
 * server turns into values per 100 g.
 */
export const houseIngredientSchema = yup
  .object({
    name: ingredientName(),
    category: yup
      .string()
      .oneOf(CATEGORIES, 'Choose a category.')
      .required('Choose a category.') as yup.StringSchema<Category>,
    servingSize: numberField('Serving size', { positive: true, max: 100000 }).required(
      'Enter the serving size from the label.',
    ),
    servingUnit: yup
      .string()
      .oneOf(['g', 'ml'] as const, 'Choose g or mL.')
      .default('g'),
    servingGrams: numberField('Grams per serving', { positive: true, max: 100000, unit: 'g' })
      .nullable()
      .default(null)
      .when('servingUnit', {
        is: 'ml',
        then: (s) => s.required('A serving in mL needs its weight in grams (from the label or by weighing).'),
      }),
    energyKcal: numberField('Energy', { min: 0, max: 1000000, unit: 'kcal' }).nullable().default(null),
    carbohydrateG: perServing('Carbohydrate'),
    sugarsG: perServing('Total sugars').required('Enter the total sugars per serving (0 if none).'),
    fibreG: perServing('Fibre'),
    fatG: perServing('Fat'),
    proteinG: perServing('Protein'),
    ...labelNutrientFields(),
    fermentableSharePct: numberField('Share of sugars yeast can ferment', { min: 0, max: 100, unit: '%' }).required(
      'Enter the fermentable share in %.',
    ),
    steepSharePct: numberField('Share of sugar reaching the liquid when steeped', {
      min: 0,
      max: 100,
      unit: '%',
    }).required('Enter the steeping share in %.'),
    allergens: yup
      .array(yup.string().oneOf(ALLERGENS, 'Not one of the major allergens.').required() as yup.StringSchema<Allergen>)
      .default([]),
    costPerKg: numberField('Cost per kg', { min: 0, max: 100000 }).nullable().default(null),
    notes: yup.string().trim().max(2000, 'Keep notes under 2,000 characters.').nullable().default(null),
  })
  .test('sugars-within-serving', 'Sugars cannot weigh more than the serving.', function (value) {
    const grams = value.servingUnit === 'ml' ? value.servingGrams : value.servingSize;
    if (!grams || value.sugarsG === null || value.sugarsG === undefined) return true;
    if (value.sugarsG > grams)
      return this.createError({
        path: 'sugarsG',
        message: `Sugars (${value.sugarsG} g) cannot weigh more than the serving (${grams} g).`,
      });
    return true;
  });
export type HouseIngredientInput = yup.InferType<typeof houseIngredientSchema>;

export const ingredientSearchSchema = yup.object({
  q: yup.string().trim().max(100, 'Keep the search under 100 characters.').default(''),
  category: yup
    .string()
    .oneOf([...CATEGORIES, ''], 'Not a category.')
    .default(''),
  page: yup.number().typeError('Page must be a number.').integer().min(1, 'Pages start at 1.').max(1000).default(1),
  pageSize: yup
    .number()
    .typeError('Page size must be a number.')
    .integer()
    .min(1)
    .max(100, 'At most 100 per page.')
    .default(25),
  archived: yup.boolean().default(false),
});
export type IngredientSearch = yup.InferType<typeof ingredientSearchSchema>;

/** Values per 100 g from values per serving: value ÷ grams per serving × 100 (to 10 significant figures, so 7 ÷ 50 × 100 is 14). */
export function per100g(value: number | null | undefined, servingGrams: number): number | null {
  if (value === null || value === undefined) return null;
  return Number(((value / servingGrams) * 100).toPrecision(10));
}

/** A dataset food copied into the house library under a name of the brewery's own. */
export const copyIngredientSchema = yup.object({ name: ingredientName() });

/** A brewery's short name for a dataset ingredient; empty goes back to the one made from the description. */
export const displayNameSchema = yup.object({
  displayName: yup
    .string()
    .trim()
    .max(80, 'Keep the display name under 80 characters.')
    .defined('Enter a display name, or leave it empty for the default.')
    .default(''),
});
export type DisplayNameInput = yup.InferType<typeof displayNameSchema>;
