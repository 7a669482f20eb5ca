import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';

import type { ErrorBody } from '../../lib/api/types';
import { config } from '../config';
import { HttpError, notFound } from '../errors';
import { logger } from '../logger';

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
  if (error instanceof SequelizeValidationError) {
    const fields = Object.fromEntries(error.errors.map((e) => [e.path ?? '_', e.message]));
    return new HttpError(400, 'invalid_input', 'Some values are not valid.', fields);
  }
  if ((error as { name?: string }).name === 'MulterError') {
    const code = (error as { code?: string }).code;
    if (code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'too_large', `The file is too large: at most ${Math.round(config.uploadMaxBytes / 1024 / 1024)} MB.`, { file: 'This file is too large.' });
    return new HttpError(400, 'invalid_upload', 'Send one file, in the field "file".', { file: 'Send one file.' });
  }
  const status = (error as { status?: number; statusCode?: number }).status ?? (error as { statusCode?: number }).statusCode;
  const type = (error as { type?: string }).type;
  if (type === 'entity.parse.failed') return new HttpError(400, 'invalid_json', 'The request body is not valid JSON.');
  if (type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (status && status >= 400 && status < 500) return new HttpError(status, 'bad_request', 'The request could not be read.');
  return new HttpError(500, 'internal', 'Something went wrong on our side. Try again; if it keeps happening, tell us.');
}

/** The one place errors become responses: `{ error: { code, message, fields? } }`, internals never shown. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const http = convert(error);
  if (http.status >= 500) logger.error({ err: error, method: req.method, path: req.path }, 'request failed');
  const body: ErrorBody = { error: { code: http.code, message: http.message, ...(http.fields ? { fields: http.fields } : {}) } };
  if (res.headersSent) return;
  res.status(http.status).json(body);
};

/**
 * Refuses state-changing API requests whose body is not JSON. Browsers cannot send a cross-site JSON body
 * without a CORS preflight, so together with the SameSite cookie this closes the door on cross-site forgery.
 */
export const requireJsonBody: RequestHandler = (req, _res, next) => {
  const changes = !['GET', 'HEAD', 'OPTIONS'].includes(req.method);
  const hasBody = Number(req.headers['content-length'] ?? 0) > 0 || req.headers['transfer-encoding'] !== undefined;
  // File uploads come as multipart; the SameSite=Lax session cookie is not sent with a cross-site POST, so a form
  // on another site cannot use the session.
  if (changes && hasBody && !req.is('application/json') && !req.is('multipart/form-data')) {
    throw new HttpError(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).');
  }
  next();
};
