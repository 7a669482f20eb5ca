import type { RequestHandler } from 'express';
import * as yup from 'yup';

import { badRequest } from '../errors';

type Part = 'body' | 'query' | 'params';
type Schemas = Partial<Record<Part, yup.AnyObjectSchema>>;

declare global {
  namespace Express {
    interface Locals {
      /** The cleaned values of the validated request parts. */
      body?: unknown;
      query?: unknown;
      params?: unknown;
    }
  }
}

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
 * Validates request parts with the shared yup schemas (every field at once) and puts the cleaned values on
 * `res.locals.body`, `res.locals.query` and `res.locals.params`. Answers one 400 listing every bad field.
 */
export function validate(schemas: Schemas): RequestHandler {
  return async (req, res, next) => {
    const fields: Record<string, string> = {};
    for (const part of Object.keys(schemas) as Part[]) {
      const schema = schemas[part]!;
      const raw: unknown = req[part] ?? {};
      if (part === 'body' && (typeof raw !== 'object' || raw === null || Array.isArray(raw))) {
        throw badRequest('The request body must be a JSON object.');
      }
      try {
        res.locals[part] = await schema.validate(raw, { abortEarly: false, stripUnknown: true });
      } catch (error) {
        if (!(error instanceof yup.ValidationError)) throw error;
        Object.assign(fields, fieldErrors(error));
      }
    }
    if (Object.keys(fields).length > 0) {
      const count = Object.keys(fields).length;
      throw badRequest(count === 1 ? 'One field needs attention.' : `${count} fields need attention.`, fields);
    }
    next();
  };
}
