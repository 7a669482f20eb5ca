import * as yup from 'yup';

import { ACCEPTED_TEMP_C } from '@/lib/chemistry/carbonation';
import { SUGAR_TYPES, type SugarType } from '@/lib/chemistry/sugars';

import { numberField } from './numbers';

export const AMOUNT_UNITS = ['g-per-l', 'g-per-bottle', 'pct-weight'] as const;
export type AmountUnit = (typeof AMOUNT_UNITS)[number];
export const AMOUNT_UNIT_LABELS: Record<AmountUnit, string> = {
  'g-per-l': 'g per litre',
  'g-per-bottle': 'g per bottle',
  'pct-weight': '% of liquid by weight',
};
/** How a batch size is given. */
export const BATCH_KINDS = ['litres', 'us-gallons', 'bottles'] as const;
export type BatchKind = (typeof BATCH_KINDS)[number];
const batchKind = () => yup.string().oneOf(BATCH_KINDS, 'Choose litres, US gallons or bottles.');
export const UNIT_SYSTEMS = ['metric', 'us'] as const;
const unitSystem = () => yup.string().oneOf(UNIT_SYSTEMS, 'Choose metric or US units.').default('metric');
/** The recipe lists: in development, archived, approved for production, or every one. */
export const RECIPE_LIST_FILTERS = ['draft', 'archived', 'approved', 'all'] as const;
export type RecipeListFilter = (typeof RECIPE_LIST_FILTERS)[number];

export const METHODS = ['in-bottle', 'steep-strain'] as const;
export type Method = (typeof METHODS)[number];
export const METHOD_LABELS: Record<Method, string> = {
  'in-bottle': 'In the bottle',
  'steep-strain': 'Steep, strain, then carbonate',
};

const temp = (label: string) => numberField(label, { min: ACCEPTED_TEMP_C.min, max: ACCEPTED_TEMP_C.max, unit: '°C' });
const hours = (label: string) => numberField(label, { min: 0, max: 24 * 60, unit: 'h' });

/** What a recipe version holds, everything per litre of finished drink or per bottle of its format. */
export const recipeContentSchema = yup.object({
  baseBrew: yup
    .object({
      name: yup.string().trim().max(80, 'Keep the base name under 80 characters.').required('Name the base brew.'),
      residualSugarGPerL: numberField('Residual sugar of the base', { min: 0, max: 150, unit: 'g/L' }).required(
        'Enter the base’s residual sugar in g/L.',
      ),
      /** How much of the residual sugar was added in processing (the primary ferment's sugar); null: all of it. */
      residualAddedSugarGPerL: numberField('Added sugar in the base’s residual sugar', {
        min: 0,
        max: 150,
        unit: 'g/L',
      })
        .nullable()
        .optional()
        .test('within-residual', 'The added part cannot be more than the residual sugar.', function (value) {
          return value === null || value === undefined || value <= (this.parent.residualSugarGPerL ?? Infinity);
        }),
      ph: numberField('pH of the base', { min: 2, max: 7 }).nullable().default(null),
      abvPercent: numberField('Alcohol of the base', { min: 0, max: 5, unit: '% ABV' }).required(
        'Enter the base’s alcohol in % ABV.',
      ),
      residualCo2Volumes: numberField('Residual CO2 of the base', { min: 0, max: 6, unit: 'volumes' })
        .nullable()
        .default(null),
      lastOpenTempC: temp('Temperature when the base was last open').nullable().default(null),
    })
    .required(),
  lines: yup
    .array(
      yup.object({
        ingredientId: numberField('Ingredient')
          .integer()
          .positive('Choose an ingredient.')
          .required('Choose an ingredient.'),
        amount: numberField('Amount', { positive: true, max: 1000 }).required('Enter the amount.'),
        unit: yup
          .string()
          .oneOf(AMOUNT_UNITS, 'Choose g per litre, g per bottle or % by weight.')
          .required('Choose a unit.'),
        /** Share of the ingredient's sugar that reaches the liquid when steeped (ignored in the bottle, where it is all). */
        extractionPct: numberField('Share of sugar reaching the liquid', { min: 0, max: 100, unit: '%' }).required(
          'Enter the share of sugar reaching the liquid.',
        ),
      }),
    )
    .max(30, 'At most 30 ingredients.')
    .default([]),
  sugars: yup
    .array(
      yup.object({
        type: yup
          .string()
          .oneOf(SUGAR_TYPES, 'Choose a sugar.')
          .required('Choose a sugar.') as yup.StringSchema<SugarType>,
        gPerL: numberField('Added sugar', { min: 0, max: 200, unit: 'g/L' }).required('Enter the added sugar in g/L.'),
      }),
    )
    .max(6, 'At most 6 sugars.')
    .default([]),
  process: yup
    .object({
      method: yup
        .string()
        .oneOf(METHODS, 'Choose how the flavour goes in.')
        .required('Choose how the flavour goes in.'),
      steepHours: hours('Steeping time').default(0),
      steepTempC: temp('Steeping temperature').default(4),
      strainLossPct: numberField('Liquid lost when straining', { min: 0, max: 60, unit: '%' }).default(0),
      carbonateHours: hours('Carbonating time').required('Enter the carbonating time in hours.'),
      carbonateTempC: temp('Carbonating temperature').required('Enter the carbonating temperature.'),
      coldStoreTempC: temp('Cold-store temperature').required('Enter the cold-store temperature.'),
    })
    .required(),
  bottleFormatId: numberField('Bottle format')
    .integer()
    .positive('Choose a bottle format.')
    .required('Choose a bottle format.'),
  targetVolumes: numberField('Target carbonation', { positive: true, max: 6, unit: 'volumes' }).required(
    'Enter the target carbonation.',
  ),
  sweetnessNote: yup.string().trim().max(200, 'Keep the note under 200 characters.').default(''),
  highestTempC: temp('Highest temperature').required('Enter the highest temperature the bottles may meet.'),
});
export type RecipeContent = yup.InferType<typeof recipeContentSchema>;

export const recipeHeaderFields = {
  name: yup
    .string()
    .trim()
    .min(2, 'Name the recipe (at least 2 characters).')
    .max(100, 'Keep the name under 100 characters.')
    .required('Name the recipe.'),
  flavourNotes: yup.string().trim().max(1000, 'Keep flavour notes under 1,000 characters.').default(''),
};

export const createRecipeSchema = yup.object({ ...recipeHeaderFields, content: recipeContentSchema.required() });
export type CreateRecipeInput = yup.InferType<typeof createRecipeSchema>;

/** Saving makes a new version; `baseVersion` is the version the editor started from, so two saves never overwrite each other silently. */
export const saveRecipeSchema = yup.object({
  ...recipeHeaderFields,
  content: recipeContentSchema.required(),
  baseVersion: numberField('Version').integer().positive().required('Say which version you edited.'),
  note: yup.string().trim().max(300, 'Keep the note under 300 characters.').default(''),
});
export type SaveRecipeInput = yup.InferType<typeof saveRecipeSchema>;

export const scaleRequestSchema = yup.object({
  batch: yup
    .object({
      kind: batchKind().required('Choose how the batch is given.'),
      value: numberField('Batch size', { positive: true, max: 1000000 }).required('Enter the batch size.'),
    })
    .required(),
  units: unitSystem(),
  version: numberField('Version').integer().positive().nullable().default(null),
});
export type ScaleRequest = yup.InferType<typeof scaleRequestSchema>;

// Query strings arrive as text: these number fields read "3" as 3 (numberField refuses strings in JSON bodies).
const queryVersion = () => yup.number().typeError('Version must be a number.').integer().positive();

export const recipeListQuerySchema = yup.object({
  q: yup.string().trim().max(100).default(''),
  status: yup.string().oneOf(RECIPE_LIST_FILTERS, 'Choose draft, archived, approved or all.').default('draft'),
});
export const versionQuerySchema = yup.object({ version: queryVersion().optional() });
export const diffQuerySchema = yup.object({
  from: yup
    .number()
    .typeError('From must be a version number.')
    .integer()
    .positive()
    .required('Give the version to compare from.'),
  to: yup
    .number()
    .typeError('To must be a version number.')
    .integer()
    .positive()
    .required('Give the version to compare to.'),
});
export const restoreVersionSchema = yup.object({
  version: numberField('Version').integer().positive().required('Give the version to restore.'),
});
export const cardQuerySchema = yup.object({
  version: queryVersion().optional(),
  kind: batchKind().default('bottles'),
  value: yup
    .number()
    .typeError('The batch size must be a number.')
    .positive('The batch size must be more than 0.')
    .max(1000000)
    .required('Give the batch size.'),
  units: unitSystem(),
  /** Paper for the PDF; US Letter when left out and the units are US, A4 otherwise. */
  paper: yup
    .string()
    .oneOf(['a4', 'letter'] as const, 'Choose A4 or Letter paper.')
    .optional(),
});
export type CardQuery = yup.InferType<typeof cardQuerySchema>;

/** The numbers of a recipe being edited, before it is saved. */
export const evaluateBodySchema = yup.object({ content: recipeContentSchema.required() });

export const tastingSchema = yup.object({
  tastedOn: yup
    .string()
    .matches(/^\d{4}-\d{2}-\d{2}$/, 'Enter the date as YYYY-MM-DD.')
    .required('Enter the date of the tasting.'),
  notes: yup.string().trim().max(2000, 'Keep notes under 2,000 characters.').default(''),
  sweetness: numberField('Sweetness', { min: 1, max: 5 })
    .integer('Score from 1 to 5.')
    .required('Score the sweetness from 1 to 5.'),
  sourness: numberField('Sourness', { min: 1, max: 5 })
    .integer('Score from 1 to 5.')
    .required('Score the sourness from 1 to 5.'),
  fizz: numberField('Fizz', { min: 1, max: 5 }).integer('Score from 1 to 5.').required('Score the fizz from 1 to 5.'),
  flavour: numberField('Flavour', { min: 1, max: 5 })
    .integer('Score from 1 to 5.')
    .required('Score the flavour from 1 to 5.'),
  sugarAddition: yup
    .object({
      type: yup
        .string()
        .oneOf(SUGAR_TYPES, 'Choose a sugar.')
        .required('Choose a sugar.') as yup.StringSchema<SugarType>,
      grams: numberField('Sugar added', { positive: true, max: 1000, unit: 'g' }).required('Enter the grams added.'),
      toMl: numberField('Liquid it went into', { positive: true, max: 100000, unit: 'mL' }).required(
        'Enter how much liquid the sugar went into, in mL.',
      ),
    })
    .nullable()
    .default(null),
});
export type TastingInput = yup.InferType<typeof tastingSchema>;
