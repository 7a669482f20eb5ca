import type { Request, RequestHandler } from 'express';

import { config } from '@/server/config';
import { HttpError } from '@/server/errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOf(url: string): string | null {
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

const appOrigin = originOf(config.appUrl);

/** The app's own origin (APP_URL, or the host the request came to) and, under `npm run dev`, the dev server's. */
function allowedOrigin(origin: string, req: Request): boolean {
  if (origin === appOrigin || config.corsOrigins.includes(origin)) return true;
  const host = req.get('host');
  return host !== undefined && origin === `${req.protocol}://${host}`;
}

/**
 * Refuses a state-changing request that a browser sent from another site: its `Origin` must be this app's, and a
 * `Sec-Fetch-Site` of `cross-site` or `same-site` without an allowed origin is refused too. Requests from programs
 * (no browser headers) pass; they carry no ambient cookie of a victim.
 */
export const sameOriginOnly: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const origin = req.get('origin');
  const site = req.get('sec-fetch-site');
  const allowed = origin !== undefined ? allowedOrigin(origin, req) : site !== 'cross-site' && site !== 'same-site';
  if (!allowed) throw new HttpError(403, 'cross_site', 'Requests from other sites cannot change anything here.');
  next();
};
