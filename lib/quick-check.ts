import * as yup from 'yup';

import type { SugarType } from './chemistry/sugars';
import { parseNumber as parse } from './forms';
import { type CarbonationRequest, carbonationSchema, type PrimingRequest, primingSchema } from './schemas/calculations';
import { convertUnit, displayUnits, type UnitSystem } from './units';

/** What the Quick check form holds: text as typed, in the person's units. */
export interface QuickCheckValues {
  bottleFormatId: string;
  liquid: string;
  headspace: string;
  maxPressure: string;
  sugars: { type: SugarType; grams: string }[];
  residualMode: 'volumes' | 'last-open';
  residualVolumes: string;
  lastOpenTemp: string;
  sealedTemp: string;
  conditioningTemp: string;
  coldTemp: string;
  highestTemp: string;
  baseAbv: string;
  yield: 'worst' | 'expected';
  targetVolumes: string;
  primingSugar: SugarType;
}

/**
 * Starting values that open in an ok state: a 750 mL bottle rated 6 bar, 3 g of sucrose, conditioned at 22 °C,
 * stored at 4 °C, 35 °C at worst, a target of 2 volumes.
 */
export function initialQuickCheckValues(units: UnitSystem): QuickCheckValues {
  const t = (c: number) => formatInput(units === 'us' ? convertUnit(c, 'C', 'F') : c, 0);
  const v = (ml: number) => formatInput(units === 'us' ? convertUnit(ml, 'ml', 'fl-oz') : ml, units === 'us' ? 1 : 0);
  return {
    bottleFormatId: '',
    liquid: v(750),
    headspace: v(30),
    maxPressure: units === 'us' ? '87' : '6',
    sugars: [{ type: 'sucrose', grams: '3' }],
    residualMode: 'last-open',
    residualVolumes: '0.9',
    lastOpenTemp: t(22),
    sealedTemp: t(20),
    conditioningTemp: t(22),
    coldTemp: t(4),
    highestTemp: t(35),
    baseAbv: '0.05',
    yield: 'worst',
    targetVolumes: '2',
    primingSugar: 'sucrose',
  };
}

const formatInput = (value: number, digits: number) => String(Number(value.toFixed(digits)));

/** Where each API field's message shows in the form. */
const FIELD_OF: Record<string, keyof QuickCheckValues | string> = {
  liquidMl: 'liquid',
  headspaceMl: 'headspace',
  maxWorkingPressureBar: 'maxPressure',
  residualCo2Volumes: 'residualVolumes',
  lastOpenTempC: 'lastOpenTemp',
  sealedTempC: 'sealedTemp',
  'temperaturesC[0]': 'conditioningTemp',
  'temperaturesC[1]': 'coldTemp',
  'temperaturesC[2]': 'highestTemp',
  baseAbvPercent: 'baseAbv',
  targetVolumes: 'targetVolumes',
  highestTempC: 'highestTemp',
};

function toSi(values: QuickCheckValues, units: UnitSystem) {
  const u = displayUnits[units];
  const volume = (text: string) => {
    const n = parse(text);
    return n === undefined || Number.isNaN(n) ? n : convertUnit(n, u.smallVolume, 'ml');
  };
  const temp = (text: string) => {
    const n = parse(text);
    return n === undefined || Number.isNaN(n) ? n : convertUnit(n, u.temperature, 'C');
  };
  const pressure = (text: string) => {
    const n = parse(text);
    return n === undefined || Number.isNaN(n) ? n : convertUnit(n, u.pressure, 'bar');
  };
  const formatId = values.bottleFormatId ? Number(values.bottleFormatId) : null;
  return {
    liquidMl: volume(values.liquid),
    headspaceMl: volume(values.headspace),
    bottleFormatId: formatId,
    maxWorkingPressureBar: formatId ? null : (pressure(values.maxPressure) ?? null),
    residualCo2Volumes: values.residualMode === 'volumes' ? parse(values.residualVolumes) : null,
    lastOpenTempC: values.residualMode === 'last-open' ? temp(values.lastOpenTemp) : null,
    sealedTempC: temp(values.sealedTemp),
    baseAbvPercent: parse(values.baseAbv) ?? 0,
    temp,
  };
}

function collect(error: unknown): Record<string, string> {
  const fields: Record<string, string> = {};
  if (error instanceof yup.ValidationError) {
    for (const inner of error.inner.length ? error.inner : [error]) {
      const path = inner.path ?? '_';
      const field = FIELD_OF[path] ?? path.replace(/^sugars\[(\d+)\]\.grams$/, 'sugars.$1.grams');
      fields[field] ??= inner.message;
    }
  }
  return fields;
}

/**
 * The Quick check form as an API request, checked with the same schema the server uses. Returns the request,
 * or the messages per form field when something is off.
 */
export function toCarbonationRequest(
  values: QuickCheckValues,
  units: UnitSystem,
): { request?: CarbonationRequest; errors: Record<string, string> } {
  const { temp, ...si } = toSi(values, units);
  const raw = {
    ...si,
    sugars: values.sugars.map((s) => ({ type: s.type, grams: parse(s.grams) })),
    temperaturesC: [temp(values.conditioningTemp), temp(values.coldTemp), temp(values.highestTemp)],
    yield: values.yield,
  };
  try {
    return { request: carbonationSchema.validateSync(raw, { abortEarly: false, stripUnknown: true }), errors: {} };
  } catch (error) {
    return { errors: collect(error) };
  }
}

/** The "sugar for target fizz" question from the same form. */
export function toPrimingRequest(
  values: QuickCheckValues,
  units: UnitSystem,
): { request?: PrimingRequest; errors: Record<string, string> } {
  const { temp, ...si } = toSi(values, units);
  const raw = {
    ...si,
    targetVolumes: parse(values.targetVolumes),
    sugarType: values.primingSugar,
    highestTempC: temp(values.highestTemp),
  };
  try {
    return { request: primingSchema.validateSync(raw, { abortEarly: false, stripUnknown: true }), errors: {} };
  } catch (error) {
    return { errors: collect(error) };
  }
}

/** Temperatures the pressure chart is drawn at, °C. */
export const CHART_TEMPERATURES_C = [0, 5, 10, 15, 20, 25, 30, 35, 40, 45];

/** The same form values in the other unit system (volumes, temperatures and the custom rating converted). */
export function convertQuickCheckValues(values: QuickCheckValues, from: UnitSystem, to: UnitSystem): QuickCheckValues {
  if (from === to) return values;
  const f = displayUnits[from];
  const t = displayUnits[to];
  const conv = (
    text: string,
    a: Parameters<typeof convertUnit>[1],
    b: Parameters<typeof convertUnit>[2],
    digits: number,
  ) => {
    const n = parse(text);
    return n === undefined || Number.isNaN(n) ? text : formatInput(convertUnit(n, a, b), digits);
  };
  const volume = (text: string) => conv(text, f.smallVolume, t.smallVolume, to === 'us' ? 2 : 0);
  const temp = (text: string) => conv(text, f.temperature, t.temperature, 1);
  return {
    ...values,
    liquid: volume(values.liquid),
    headspace: volume(values.headspace),
    maxPressure: conv(values.maxPressure, f.pressure, t.pressure, to === 'us' ? 1 : 2),
    lastOpenTemp: temp(values.lastOpenTemp),
    sealedTemp: temp(values.sealedTemp),
    conditioningTemp: temp(values.conditioningTemp),
    coldTemp: temp(values.coldTemp),
    highestTemp: temp(values.highestTemp),
  };
}
