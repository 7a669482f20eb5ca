import * as yup from 'yup';

import { numberField } from './numbers';
import { BATCH_KINDS } from './recipes';

export const BATCH_STATES = ['in-progress', 'awaiting-decision', 'released', 'held', 'discarded'] as const;
export type BatchState = (typeof BATCH_STATES)[number];
export const BATCH_STATE_LABELS: Record<BatchState, string> = {
  'in-progress': 'In progress',
  'awaiting-decision': 'Waiting for a decision',
  released: 'Released',
  held: 'Held',
  discarded: 'Discarded',
};

export const READING_KINDS = ['ph', 'brix', 'specific-gravity', 'temperature', 'gauge-pressure', 'abv'] as const;
export type ReadingKind = (typeof READING_KINDS)[number];
export const READING_KIND_LABELS: Record<ReadingKind, string> = {
  ph: 'pH',
  brix: 'Brix',
  'specific-gravity': 'Specific gravity',
  temperature: 'Temperature',
  'gauge-pressure': 'Test-bottle pressure',
  abv: 'Alcohol (ABV)',
};
export const READING_UNITS: Record<ReadingKind, string> = {
  ph: '',
  brix: '°Bx',
  'specific-gravity': '',
  temperature: '°C',
  'gauge-pressure': 'bar',
  abv: '% ABV',
};

export const STAGES = ['base', 'after-flavour', 'after-strain', 'conditioning', 'cold-store', 'finished'] as const;
export type Stage = (typeof STAGES)[number];
export const STAGE_LABELS: Record<Stage, string> = {
  base: 'Base, before flavouring',
  'after-flavour': 'After flavouring',
  'after-strain': 'After straining',
  conditioning: 'Conditioning',
  'cold-store': 'Cold store',
  finished: 'Finished',
};

export const ABV_SOURCES = ['in-house', 'lab'] as const;
export const DECISIONS = ['released', 'held', 'discarded'] as const;
export type Decision = (typeof DECISIONS)[number];

/** What each kind of reading may be: beyond these a value is a typo or a broken meter (the ranges). */
export const READING_RANGES: Record<ReadingKind, { min: number; max: number }> = {
  ph: { min: 0, max: 14 },
  brix: { min: 0, max: 85 },
  'specific-gravity': { min: 0.98, max: 1.5 },
  temperature: { min: -5, max: 100 },
  'gauge-pressure': { min: 0, max: 30 },
  abv: { min: 0, max: 20 },
};

const text = (max: number, label: string) => yup.string().trim().max(max, `Keep ${label} under ${max} characters.`);

export const startBatchSchema = yup.object({
  recipeId: numberField('Recipe').integer().positive().required('Choose the recipe.'),
  version: numberField('Version').integer().positive().required('Choose the version.'),
  batch: yup
    .object({
      kind: yup
        .string()
        .oneOf(BATCH_KINDS, 'Choose litres, US gallons or bottles.')
        .required('Choose how the batch is given.'),
      value: numberField('Batch size', { positive: true, max: 1000000 }).required('Enter the batch size.'),
    })
    .required('Give the batch size.'),
  trial: yup.boolean().strict().default(false),
});
export type StartBatchInput = yup.InferType<typeof startBatchSchema>;

export const readingSchema = yup
  .object({
    kind: yup.string().oneOf(READING_KINDS, 'Choose what was measured.').required('Choose what was measured.'),
    value: numberField('Reading').required('Enter the reading.'),
    tempC: numberField('Temperature of the reading', { min: -5, max: 100, unit: '°C' }).nullable().default(null),
    stage: yup.string().oneOf(STAGES, 'Choose the stage.').required('Choose the stage.'),
    source: yup.string().oneOf(ABV_SOURCES, 'Choose in-house or lab.').nullable().default(null),
    takenAt: yup.date().typeError('Give the time as a date and time.').nullable().default(null),
    note: text(1000, 'the note').default(''),
    correctsId: numberField('Corrected reading').integer().positive().nullable().default(null),
  })
  .test('in-range', function (value) {
    // Only a kind the schema knows has a range (an unknown kind has its own message already).
    const range = Object.prototype.hasOwnProperty.call(READING_RANGES, value.kind ?? '')
      ? READING_RANGES[value.kind]
      : undefined;
    if (!range || typeof value.value !== 'number') return true;
    if (value.value < range.min || value.value > range.max) {
      const unit = READING_UNITS[value.kind] ? ` ${READING_UNITS[value.kind]}` : '';
      return this.createError({
        path: 'value',
        message: `A ${READING_KIND_LABELS[value.kind]} reading must be from ${range.min} to ${range.max}${unit}.`,
      });
    }
    if (value.kind === 'gauge-pressure' && (value.tempC === null || value.tempC === undefined)) {
      return this.createError({
        path: 'tempC',
        message: 'Give the temperature of the test bottle: pressure means nothing without it.',
      });
    }
    return true;
  });
export type ReadingInput = yup.InferType<typeof readingSchema>;

export const stepSignOffSchema = yup.object({ note: text(500, 'the note').default('') });

export const ingredientLotSchema = yup
  .object({
    ingredientId: numberField('Ingredient').integer().positive().nullable().default(null),
    ingredientName: text(200, 'the ingredient name').default(''),
    supplier: text(200, 'the supplier').default(''),
    supplierLot: text(100, "the supplier's lot").required("Enter the supplier's lot code."),
    quantity: yup
      .string()
      .trim()
      .max(60, 'Keep the quantity short, e.g. "2 kg".')
      // Read with mathjs's units by the server (lib/batches/quantity.ts), which names this field when it is not a
      // quantity: mathjs stays off the web bundle.
      .required('Enter the quantity with its unit, e.g. "2 kg" or "3 gal".'),
    correctsId: numberField('Corrected lot').integer().positive().nullable().default(null),
  })
  .test('which-ingredient', function (value) {
    if (value.ingredientId || (value.ingredientName ?? '').length >= 2) return true;
    return this.createError({ path: 'ingredientName', message: 'Choose an ingredient or write its name.' });
  });
export type IngredientLotInput = yup.InferType<typeof ingredientLotSchema>;

export const deviationSchema = yup.object({
  whatHappened: text(2000, 'what happened').min(3, 'Say what happened.').required('Say what happened.'),
  actionTaken: text(2000, 'what was done')
    .min(3, 'Say what was done about it.')
    .required('Say what was done about it.'),
  closesReadingId: numberField('Reading it closes').integer().positive().nullable().default(null),
  correctsId: numberField('Corrected entry').integer().positive().nullable().default(null),
});
export type DeviationInput = yup.InferType<typeof deviationSchema>;

export const decisionSchema = yup.object({
  decision: yup.string().oneOf(DECISIONS, 'Choose released, held or discarded.').required('Choose the decision.'),
  note: text(2000, 'the note').default(''),
  overrideReason: text(2000, 'the reason').nullable().default(null),
});
export type DecisionInput = yup.InferType<typeof decisionSchema>;

export const batchListQuerySchema = yup.object({
  state: yup
    .string()
    .oneOf([...BATCH_STATES, 'all'] as const, 'Choose a state or all.')
    .default('all'),
  recipeId: yup.number().typeError('Recipe must be a number.').integer().positive().optional(),
  lot: yup.string().trim().max(40).default(''),
  page: yup.number().typeError('Page must be a number.').integer().min(1).max(10000).default(1),
  pageSize: yup.number().typeError('Page size must be a number.').integer().min(1).max(100).default(25),
});
export type BatchListQuery = yup.InferType<typeof batchListQuerySchema>;

export const traceQuerySchema = yup.object({
  supplierLot: yup
    .string()
    .trim()
    .min(1, "Give the supplier's lot code.")
    .max(100)
    .required("Give the supplier's lot code."),
});

export const stepParamsSchema = yup.object({
  id: yup.number().typeError('Id must be a number.').integer().positive().required(),
  n: yup.number().typeError('Step must be a number.').integer().min(1).max(100).required(),
});

export const readingParamsSchema = yup.object({
  id: yup.number().typeError('Id must be a number.').integer().positive().required(),
  readingId: yup.number().typeError('Reading must be a number.').integer().positive().required(),
});

export const lotParamsSchema = yup.object({ lotCode: yup.string().trim().min(3).max(40).required() });
