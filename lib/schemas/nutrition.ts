import * as yup from 'yup';

import { LABEL_NUTRIENTS, type LabelNutrient, NUTRIENT_NAMES, NUTRIENT_UNITS } from '@/lib/nutrition/label-rules';

import { numberField } from './numbers';

/** `?version=&servingMl=`: a version of the recipe (the newest when left out) and a serving other than the rule's. */
export const nutritionQuerySchema = yup.object({
  version: yup.number().typeError('Version must be a number.').integer().positive().optional(),
  servingMl: yup
    .number()
    .typeError('The serving must be a number of mL.')
    .min(10, 'A serving is at least 10 mL.')
    .max(5000, 'A serving is at most 5,000 mL.')
    .optional(),
});
export type NutritionQuery = yup.InferType<typeof nutritionQuerySchema>;

/** The files add which basis to draw: as formulated, after conditioning, or the lab's (the declared one by default). */
export const nutritionFileQuerySchema = nutritionQuerySchema.shape({
  basis: yup
    .string()
    .oneOf(['asFormulated', 'afterConditioning', 'lab'] as const, 'Choose asFormulated, afterConditioning or lab.')
    .optional(),
});

/** The most a lab may report per 100 mL of a drink, by unit: beyond these a value is a typing slip. */
const MOST_PER_100_ML = { kcal: 900, g: 100, mg: 10000, mcg: 10000 } as const;

const labValue = (nutrient: LabelNutrient) => {
  const unit = NUTRIENT_UNITS[nutrient];
  return numberField(NUTRIENT_NAMES[nutrient], { min: 0, max: MOST_PER_100_ML[unit], unit }).nullable().default(null);
};

/**
 * Lab values per 100 mL of the finished drink for one version, as an owner enters them from the lab's report. Any
 * nutrient may be left empty (the estimate stays for it); all empty clears the lab values.
 */
export const labValuesSchema = yup.object({
  version: numberField('Version').integer().positive().required('Say which version the lab analysed.'),
  per100Ml: yup
    .object(
      Object.fromEntries(LABEL_NUTRIENTS.map((n) => [n, labValue(n)])) as Record<
        LabelNutrient,
        ReturnType<typeof labValue>
      >,
    )
    .default({})
    .test('sugars-within-carbohydrate', 'Total sugars cannot be more than total carbohydrate.', function (value) {
      const { totalSugars, totalCarbohydrate } = value ?? {};
      if (
        totalSugars === null ||
        totalSugars === undefined ||
        totalCarbohydrate === null ||
        totalCarbohydrate === undefined
      )
        return true;
      return totalSugars <= totalCarbohydrate
        ? true
        : this.createError({
            path: 'per100Ml.totalSugars',
            message: `Total sugars (${totalSugars} g) cannot be more than total carbohydrate (${totalCarbohydrate} g).`,
          });
    }),
  reference: yup.string().trim().max(200, 'Keep the reference under 200 characters.').default(''),
});
export type LabValuesInput = yup.InferType<typeof labValuesSchema>;
