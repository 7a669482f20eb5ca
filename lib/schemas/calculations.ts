import * as yup from 'yup';

import { ACCEPTED_TEMP_C } from '@/lib/chemistry/carbonation';
import { SUGAR_TYPES, type SugarType } from '@/lib/chemistry/sugars';

import { numberField } from './numbers';

const temperature = (label: string) =>
  numberField(label, { min: ACCEPTED_TEMP_C.min, max: ACCEPTED_TEMP_C.max, unit: '°C' });
const sugarType = () =>
  yup.string().oneOf(SUGAR_TYPES, `Choose one of: ${SUGAR_TYPES.join(', ')}.`) as yup.StringSchema<SugarType>;
const yieldCase = () =>
  yup
    .string()
    .oneOf(['worst', 'expected'] as const, 'Choose worst or expected.')
    .default('worst');

/** Container and residual CO2, shared by the carbonation and priming questions. */
const containerFields = {
  liquidMl: numberField('Liquid per container', { positive: true, max: 30000, unit: 'mL' }).required(
    'Enter the liquid per container in mL.',
  ),
  // No default: a headspace taken as 0 would be a full bottle, and any other figure a guess. A bottle format gives one.
  headspaceMl: numberField('Headspace', { min: 0, max: 5000, unit: 'mL' }).when('bottleFormatId', {
    is: (id: unknown) => id === undefined || id === null,
    then: (s) => s.required('Enter the headspace in mL, or choose a bottle format that gives it.'),
    otherwise: (s) => s.optional(),
  }),
  residualCo2Volumes: numberField('Residual CO2', { min: 0, max: 6, unit: 'volumes' }).nullable(),
  lastOpenTempC: temperature('Temperature when last open').nullable(),
  sealedTempC: temperature('Temperature when sealed').default(20),
  bottleFormatId: numberField('Bottle format')
    .integer('Choose a bottle format.')
    .positive('Choose a bottle format.')
    .nullable(),
  maxWorkingPressureBar: numberField('Maximum working pressure', { positive: true, max: 30, unit: 'bar' }).nullable(),
  baseAbvPercent: numberField('Alcohol of the base', { min: 0, max: 20, unit: '% ABV' }).default(0),
  abvLimitPercent: numberField('Alcohol limit', { positive: true, max: 20, unit: '% ABV' }).nullable(),
  yield: yieldCase(),
};

export const carbonationSchema = yup.object({
  ...containerFields,
  sugars: yup
    .array(
      yup.object({
        type: sugarType().required('Choose the sugar.'),
        grams: numberField('Sugar', { min: 0, max: 5000, unit: 'g' }).required('Enter the grams of sugar.'),
      }),
    )
    .max(20, 'At most 20 sugars.')
    .default([]),
  ingredients: yup
    .array(
      yup.object({
        ingredientId: numberField('Ingredient')
          .integer('Choose an ingredient.')
          .positive('Choose an ingredient.')
          .required('Choose an ingredient.'),
        grams: numberField('Ingredient amount', { positive: true, max: 10000, unit: 'g' }).required(
          'Enter the grams of the ingredient.',
        ),
        extractionPct: numberField('Share of sugar reaching the liquid', { min: 0, max: 100, unit: '%' }).default(100),
        inBottle: yup.boolean().default(false),
      }),
    )
    .max(40, 'At most 40 ingredients.')
    .default([]),
  temperaturesC: yup
    .array(temperature('Temperature').required('Enter a temperature.'))
    .min(1, 'Give at least one temperature to check.')
    .max(12, 'At most 12 temperatures.')
    .default([4, 20, 35]),
  solidsInBottle: yup.boolean().default(false),
});
export type CarbonationRequest = yup.InferType<typeof carbonationSchema>;

export const primingSchema = yup.object({
  ...containerFields,
  targetVolumes: numberField('Target carbonation', { positive: true, max: 6, unit: 'volumes' }).required(
    'Enter the target carbonation in volumes.',
  ),
  sugarType: sugarType().default('sucrose'),
  highestTempC: temperature('Highest temperature').default(35),
});
export type PrimingRequest = yup.InferType<typeof primingSchema>;

export const brixSchema = yup
  .object({
    brix: numberField('Brix', { min: 0, max: 85, unit: '°Bx' }).nullable(),
    specificGravity: numberField('Specific gravity', { min: 0.98, max: 1.5 }).nullable(),
  })
  .test('one-reading', 'Give either brix or specificGravity, not both.', function (value) {
    const given = [value.brix, value.specificGravity].filter((v) => v !== undefined && v !== null).length;
    if (given === 1) return true;
    return this.createError({
      path: given === 0 ? 'brix' : 'specificGravity',
      message:
        given === 0 ? 'Give a Brix or a specific gravity reading.' : 'Give either Brix or specific gravity, not both.',
    });
  });
export type BrixRequest = yup.InferType<typeof brixSchema>;
