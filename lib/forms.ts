import * as yup from 'yup';

/**
 * Forms keep what people type as text; the shared API schemas want numbers. These helpers turn the typed text
 * into the request and map the schema's messages back onto the form's fields.
 */

/** Text to number: empty becomes undefined (the schema names it as missing), a comma decimal is accepted, anything else NaN. */
export function parseNumber(text: string | null | undefined): number | undefined {
  const trimmed = (text ?? '').trim().replace(',', '.');
  if (trimmed === '') return undefined;
  return /^-?\d*\.?\d+$|^-?\d+\.$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** Validates `candidate` with `schema`: the cleaned value, or the first message per field path. */
export function check<T>(schema: yup.Schema<T>, candidate: unknown): { value?: T; errors: Record<string, string> } {
  try {
    return { value: schema.validateSync(candidate, { abortEarly: false, stripUnknown: true }), errors: {} };
  } catch (error) {
    if (!(error instanceof yup.ValidationError)) throw error;
    const errors: Record<string, string> = {};
    for (const inner of error.inner.length ? error.inner : [error]) errors[inner.path ?? '_'] ??= inner.message;
    return { errors };
  }
}
