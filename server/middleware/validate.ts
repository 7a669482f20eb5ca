import type { Request, RequestHandler, Response } from 'express';
import * as yup from 'yup';

import { badRequest } from '@/server/errors';

type Part = 'body' | 'query' | 'params';
type Schemas = Partial<Record<Part, yup.AnyObjectSchema>>;

/** The cleaned values of the validated parts, typed by their schemas. */
export type Validated<S extends Schemas> = {
  [K in keyof S]: S[K] extends yup.AnyObjectSchema ? yup.InferType<S[K]> : never;
};

/** A route's own work, given the validated request values (and the response, and the raw request for headers and files). */
export type Handler<S extends Schemas> = (values: Validated<S>, res: Response, req: Request) => unknown;

/** Turns a yup error into `{ field: message }`, the first message of each field. */
export function fieldErrors(error: yup.ValidationError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const inner of error.inner.length > 0 ? error.inner : [error]) {
    const key = inner.path || '_';
    if (!(key in fields)) fields[key] = inner.errors[0] ?? inner.message;
  }
  return fields;
}

/**
 * Names that must never be a key of a request value: Object.prototype's own (constructor, __proto__, toString, ...)
 * and prototype. yup and plain-object code look such keys up as if they were fields and fail on what they find.
 */
const RESERVED_KEYS = new Set([...Object.getOwnPropertyNames(Object.prototype), 'prototype']);

interface Described {
  type?: string;
  fields?: Record<string, Described>;
  innerType?: Described;
}

const schemaFor = (schema: Described | undefined, key: string): Described | undefined =>
  schema?.fields && Object.prototype.hasOwnProperty.call(schema.fields, key) ? schema.fields[key] : undefined;

/**
 * Checks the shape of a raw request value against its schema before yup casts it: text where the schema wants text
 * (not a list or an object), no NUL characters, no reserved key names, one value per query parameter. yup's own
 * transforms (trim, lowercase) would throw on such values instead of naming the field.
 */
function shapeProblems(
  value: unknown,
  schema: Described | undefined,
  path: string,
  fields: Record<string, string>,
  part: Part,
): void {
  const at = path || part;
  if (typeof value === 'string') {
    if (value.includes('\u0000')) fields[at] = 'Remove the NUL character from this text.';
    return;
  }
  if (Array.isArray(value)) {
    if (part === 'query' && !path.includes('.')) fields[at] = 'Give this parameter once.';
    else if (schema?.type && schema.type !== 'array' && schema.type !== 'mixed')
      fields[at] = schema.type === 'string' ? 'Give text here, not a list.' : 'Give a single value here, not a list.';
    else value.forEach((item, i) => shapeProblems(item, schema?.innerType, `${path}[${i}]`, fields, part));
    return;
  }
  if (value !== null && typeof value === 'object') {
    if (schema?.type && schema.type !== 'object' && schema.type !== 'mixed') {
      fields[at] = schema.type === 'string' ? 'Give text here.' : 'Give a single value here, not an object.';
      return;
    }
    for (const key of Object.keys(value)) {
      const inner = path ? `${path}.${key}` : key;
      // defineProperty, since assigning to a key named __proto__ would not make a field of it.
      if (RESERVED_KEYS.has(key))
        Object.defineProperty(fields, inner, {
          value: 'This field name is not accepted.',
          enumerable: true,
          writable: true,
          configurable: true,
        });
      else shapeProblems((value as Record<string, unknown>)[key], schemaFor(schema, key), inner, fields, part);
    }
    return;
  }
  if (schema?.type === 'string' && value !== undefined && value !== null) fields[at] = 'Give text here.';
}

/**
 * Validates request parts with the shared yup schemas (every field at once), then hands the route's handler the
 * cleaned values with the types the schemas give them. Answers one 400 listing every bad field.
 */
export function validate<S extends Schemas>(schemas: S, handler: Handler<S>): RequestHandler {
  return async (req, res) => {
    const fields: Record<string, string> = {};
    const values: Partial<Record<Part, unknown>> = {};
    for (const part of Object.keys(schemas) as Part[]) {
      const schema = schemas[part] as yup.AnyObjectSchema;
      const raw: unknown = req[part] ?? {};
      if (part === 'body' && (typeof raw !== 'object' || raw === null || Array.isArray(raw))) {
        throw badRequest('The request body must be a JSON object.');
      }
      const problems: Record<string, string> = {};
      shapeProblems(raw, schema as unknown as Described, '', problems, part);
      if (Object.keys(problems).length > 0) {
        for (const [key, message] of Object.entries(problems))
          Object.defineProperty(fields, key, { value: message, enumerable: true, writable: true, configurable: true });
        continue;
      }
      try {
        values[part] = await schema.validate(raw, { abortEarly: false, stripUnknown: true });
      } catch (error) {
        // Anything but a validation error means a value yup could not even read: still the caller's input.
        if (error instanceof yup.ValidationError) Object.assign(fields, fieldErrors(error));
        else fields[part] = 'This part of the request could not be read.';
      }
    }
    if (Object.keys(fields).length > 0) {
      const count = Object.keys(fields).length;
      throw badRequest(count === 1 ? 'One field needs attention.' : `${count} fields need attention.`, fields);
    }
    // Every part in `schemas` has its value here: a failed part threw above.
    await handler(values as Validated<S>, res, req);
  };
}
