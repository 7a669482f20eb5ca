import * as yup from 'yup';

interface Range {
  min?: number;
  max?: number;
  /** Unit shown in messages, e.g. "mL" or "°C". */
  unit?: string;
  /** Refuse 0 itself (for amounts that must be positive). */
  positive?: boolean;
}

/**
 * A number field of the API: a JSON number (strings are refused, so a wrong type is named rather than guessed at)
 * within a range, with messages that name the field and its unit.
 */
export function numberField(label: string, { min, max, unit = '', positive = false }: Range = {}) {
  const u = unit ? ` ${unit}` : '';
  // Only JSON numbers count: a string such as "25" becomes NaN here and fails with the type message. (yup's
  // strict() would do the same but also skip defaults.)
  let schema = yup
    .number()
    .transform((value: number, original: unknown) =>
      original === undefined || original === null || typeof original === 'number' ? value : NaN,
    )
    .typeError(`${label} must be a number.`);
  if (positive) schema = schema.moreThan(0, `${label} must be more than 0${u}.`);
  if (min !== undefined) schema = schema.min(min, `${label} must be at least ${min}${u}.`);
  if (max !== undefined) schema = schema.max(max, `${label} must be at most ${max}${u}.`);
  return schema;
}
