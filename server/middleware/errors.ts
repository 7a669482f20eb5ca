import type { ErrorRequestHandler, RequestHandler } from 'express';
import { DatabaseError, UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';

import type { ErrorBody } from '@/lib/api/types';
import { HttpError, notFound } from '@/server/errors';
import { logger } from '@/server/logger';

/** Any /api path no route answered. */
export const apiNotFound: RequestHandler = (req) => {
  throw notFound(`No API route ${req.method} ${req.path}.`);
};

function convert(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  // Sequelize's SQLite dialect reports every constraint failure (NOT NULL too) as a UniqueConstraintError.
  if (error instanceof UniqueConstraintError && /UNIQUE/i.test(error.parent?.message ?? '')) {
    const fields = Object.fromEntries(error.errors.map((e) => [e.path ?? '_', 'This value is already used.']));
    return new HttpError(409, 'conflict', 'This value is already used.', fields);
  }
  // PostgreSQL's data exceptions (class 22: a number past its column's range, text too long for it) are the sender's
  // values, wherever a schema let them through.
  if (error instanceof DatabaseError && /^22/.test(String((error.parent as { code?: unknown }).code ?? '')))
    return new HttpError(400, 'invalid_input', 'A value is out of range or too long.');
  if (error instanceof SequelizeValidationError) {
    const fields = Object.fromEntries(error.errors.map((e) => [e.path ?? '_', e.message]));
    return new HttpError(400, 'invalid_input', 'Some values are not valid.', fields);
  }
  const status =
    (error as { status?: number; statusCode?: number }).status ?? (error as { statusCode?: number }).statusCode;
  const type = (error as { type?: string }).type;
  if (type === 'entity.parse.failed') return new HttpError(400, 'invalid_json', 'The request body is not valid JSON.');
  if (type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (status && status >= 400 && status < 500)
    return new HttpError(status, 'bad_request', 'The request could not be read.');
  return new HttpError(500, 'internal', 'Something went wrong on our side. Try again; if it keeps happening, tell us.');
}

/** The one place errors become responses: `{ error: { code, message, fields? } }`, internals never shown. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const http = convert(error);
  if (http.status >= 500) logger.error({ err: error, method: req.method, path: req.path }, 'request failed');
  const body: ErrorBody = {
    error: { code: http.code, message: http.message, ...(http.fields ? { fields: http.fields } : {}) },
  };
  if (res.headersSent) return;
  res.status(http.status).json(body);
};
