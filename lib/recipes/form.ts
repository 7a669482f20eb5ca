import { setIn } from 'formik';
import * as yup from 'yup';

import type { SugarType } from '@/lib/chemistry/sugars';
import { check, parseNumber } from '@/lib/forms';
import { type Method, type RecipeContent, recipeContentSchema, recipeHeaderFields } from '@/lib/schemas/recipes';

/** The designer's form: text as typed, one field per number of the recipe. */
export interface RecipeFormValues {
  name: string;
  flavourNotes: string;
  base: {
    name: string;
    residualSugarGPerL: string;
    /** Of the residual sugar, what was added in processing; empty: all of it. */
    residualAddedSugarGPerL: string;
    ph: string;
    abvPercent: string;
    residualMode: 'volumes' | 'last-open';
    residualCo2Volumes: string;
    lastOpenTempC: string;
  };
  lines: {
    ingredientId: number;
    name: string;
    amount: string;
    unit: 'g-per-l' | 'g-per-bottle' | 'pct-weight';
    extractionPct: string;
  }[];
  sugars: { type: SugarType; gPerL: string }[];
  method: Method;
  steepHours: string;
  steepTempC: string;
  strainLossPct: string;
  carbonateHours: string;
  carbonateTempC: string;
  coldStoreTempC: string;
  bottleFormatId: string;
  targetVolumes: string;
  sweetnessNote: string;
  highestTempC: string;
}

const t = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));
const n = (text: string) => parseNumber(text);
const nOrNull = (text: string) => parseNumber(text) ?? null;

export function toFormValues(
  name: string,
  flavourNotes: string,
  c: RecipeContent,
  names: Record<number, string>,
): RecipeFormValues {
  return {
    name,
    flavourNotes,
    base: {
      name: c.baseBrew.name,
      residualSugarGPerL: t(c.baseBrew.residualSugarGPerL),
      residualAddedSugarGPerL: t(c.baseBrew.residualAddedSugarGPerL),
      ph: t(c.baseBrew.ph),
      abvPercent: t(c.baseBrew.abvPercent),
      residualMode:
        c.baseBrew.residualCo2Volumes !== null && c.baseBrew.residualCo2Volumes !== undefined ? 'volumes' : 'last-open',
      residualCo2Volumes: t(c.baseBrew.residualCo2Volumes),
      lastOpenTempC: t(c.baseBrew.lastOpenTempC),
    },
    lines: c.lines.map((l) => ({
      ingredientId: l.ingredientId,
      name: names[l.ingredientId] ?? `Ingredient ${l.ingredientId}`,
      amount: t(l.amount),
      unit: l.unit as RecipeFormValues['lines'][number]['unit'],
      extractionPct: t(l.extractionPct),
    })),
    sugars: c.sugars.map((s) => ({ type: s.type, gPerL: t(s.gPerL) })),
    method: c.process.method as Method,
    steepHours: t(c.process.steepHours),
    steepTempC: t(c.process.steepTempC),
    strainLossPct: t(c.process.strainLossPct),
    carbonateHours: t(c.process.carbonateHours),
    carbonateTempC: t(c.process.carbonateTempC),
    coldStoreTempC: t(c.process.coldStoreTempC),
    bottleFormatId: String(c.bottleFormatId),
    targetVolumes: t(c.targetVolumes),
    sweetnessNote: c.sweetnessNote ?? '',
    highestTempC: t(c.highestTempC),
  };
}

function candidate(v: RecipeFormValues) {
  const steep = v.method === 'steep-strain';
  return {
    baseBrew: {
      name: v.base.name,
      residualSugarGPerL: n(v.base.residualSugarGPerL),
      residualAddedSugarGPerL: nOrNull(v.base.residualAddedSugarGPerL),
      ph: nOrNull(v.base.ph),
      abvPercent: n(v.base.abvPercent),
      residualCo2Volumes: v.base.residualMode === 'volumes' ? n(v.base.residualCo2Volumes) : null,
      lastOpenTempC: v.base.residualMode === 'last-open' ? n(v.base.lastOpenTempC) : null,
    },
    lines: v.lines.map((l) => ({
      ingredientId: l.ingredientId,
      amount: n(l.amount),
      unit: l.unit,
      extractionPct: n(l.extractionPct),
    })),
    sugars: v.sugars.map((s) => ({ type: s.type, gPerL: n(s.gPerL) })),
    process: {
      method: v.method,
      steepHours: steep ? n(v.steepHours) : 0,
      steepTempC: steep ? n(v.steepTempC) : 4,
      strainLossPct: steep ? n(v.strainLossPct) : 0,
      carbonateHours: n(v.carbonateHours),
      carbonateTempC: n(v.carbonateTempC),
      coldStoreTempC: n(v.coldStoreTempC),
    },
    bottleFormatId: v.bottleFormatId ? Number(v.bottleFormatId) : undefined,
    targetVolumes: n(v.targetVolumes),
    sweetnessNote: v.sweetnessNote,
    highestTempC: n(v.highestTempC),
  };
}

/** Where each content path's message shows in the form. */
const FIELD: Record<string, string> = {
  baseBrew: 'base',
  'process.method': 'method',
  'process.steepHours': 'steepHours',
  'process.steepTempC': 'steepTempC',
  'process.strainLossPct': 'strainLossPct',
  'process.carbonateHours': 'carbonateHours',
  'process.carbonateTempC': 'carbonateTempC',
  'process.coldStoreTempC': 'coldStoreTempC',
};

function formPath(path: string): string {
  const dotted = path.replace(/\[(\d+)\]/g, '.$1');
  if (FIELD[dotted]) return FIELD[dotted];
  return dotted.replace(/^baseBrew\./, 'base.');
}

/** The form as recipe content, checked with the schema the server uses; errors shaped for formik. */
const headerSchema = yup.object(recipeHeaderFields);

export function toContent(values: RecipeFormValues): { content?: RecipeContent; errors: Record<string, unknown> } {
  const { value, errors } = check(recipeContentSchema, candidate(values));
  const header = check(headerSchema, { name: values.name, flavourNotes: values.flavourNotes });
  return { content: value, errors: formErrors({ ...errors, ...header.errors }) };
}

/**
 * Messages by schema path (the form's own check, or the server's 400: `content.lines[0].amount`, `name`) shaped for
 * formik, so that each lands on the field the person typed into.
 */
export function formErrors(fields: Record<string, string>): Record<string, unknown> {
  let shaped: Record<string, unknown> = {};
  for (const [path, message] of Object.entries(fields))
    shaped = setIn(shaped, formPath(path.replace(/^content\./, '')), message);
  return shaped;
}
