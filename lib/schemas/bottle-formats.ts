import * as yup from 'yup';

import { numberField } from './numbers';

export const CLOSURES = ['crown-cap', 'swing-top', 'cork-and-cage', 'screw-cap'] as const;
export type Closure = (typeof CLOSURES)[number];
export const CLOSURE_LABELS: Record<Closure, string> = {
  'crown-cap': 'Crown cap',
  'swing-top': 'Swing top',
  'cork-and-cage': 'Cork and cage',
  'screw-cap': 'Screw cap',
};

export const MATERIALS = ['glass', 'pet'] as const;
export type Material = (typeof MATERIALS)[number];
export const MATERIAL_LABELS: Record<Material, string> = { glass: 'Glass', pet: 'PET plastic' };

export const bottleFormatSchema = yup.object({
  name: yup
    .string()
    .trim()
    .min(1, 'Name the format.')
    .max(60, 'Keep the name under 60 characters.')
    .required('Name the format.'),
  liquidMl: numberField('Liquid volume', { positive: true, max: 30000, unit: 'mL' }).required(
    'Enter the liquid volume in mL.',
  ),
  headspaceMl: numberField('Headspace', { min: 0, max: 5000, unit: 'mL' }).required(
    'Enter the headspace in mL (0 if none).',
  ),
  closure: yup.string().oneOf(CLOSURES, 'Choose a closure.').required('Choose a closure.') as yup.StringSchema<Closure>,
  material: yup
    .string()
    .oneOf(MATERIALS, 'Choose glass or PET.')
    .required('Choose glass or PET.') as yup.StringSchema<Material>,
  maxWorkingPressureBar: numberField('Maximum working pressure', { min: 0.5, max: 20, unit: 'bar' }).required(
    "Enter the maximum working pressure from the supplier's sheet, in bar.",
  ),
  pressureSource: yup
    .string()
    .trim()
    .min(1, 'Say where the pressure figure comes from.')
    .max(200, 'Keep the source under 200 characters.')
    .required('Say where the pressure figure comes from (e.g. the supplier and sheet).'),
  notes: yup.string().trim().max(500, 'Keep notes under 500 characters.').nullable().default(null),
});
export type BottleFormatInput = yup.InferType<typeof bottleFormatSchema>;

/** The bottle formats list: the current ones, or the archived. */
export const bottleFormatListQuerySchema = yup.object({ archived: yup.boolean().default(false) });
