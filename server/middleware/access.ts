import type { RequestHandler } from 'express';

import { can, type Capability } from '@/lib/roles';
import { forbidden, HttpError, unauthorized } from '@/server/errors';
import { type AuthContext, authenticateToken, SESSION_COOKIE } from '@/server/services/sessions';

/** Who may call a route: anyone, any signed-in member, or members whose role has a capability (`lib/roles.ts`). */
export type Access = 'public' | 'signed-in' | Capability;

declare global {
  namespace Express {
    interface Locals {
      auth?: AuthContext;
    }
  }
}

/** Marks the middleware made by `allow`, so a test can prove every route declares its access. */
export const ACCESS = Symbol('access');

export function tokenFrom(req: Parameters<RequestHandler>[0]): string | undefined {
  const cookie = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  if (cookie) return cookie;
  const header = req.headers.authorization;
  return header?.startsWith('Bearer ') ? header.slice(7) : undefined;
}

const CHANGES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * What a state-changing route takes as its body: JSON everywhere, multipart only where a route says so. A body
 * of any other type is refused, even an empty one, so a plain HTML form on another site can never reach a route.
 */
function assertBodyType(req: Parameters<RequestHandler>[0], accepts: 'json' | 'multipart'): void {
  if (!CHANGES.has(req.method)) return;
  if (accepts === 'multipart' ? req.is('multipart/form-data') : req.is('application/json')) return;
  throw new HttpError(
    415,
    'unsupported_media_type',
    accepts === 'multipart'
      ? 'Send the file as multipart/form-data.'
      : 'Send the request body as JSON (Content-Type: application/json), even when it is empty ({}).',
  );
}

/**
 * The first handler of every API route. Checks the body's type, the session (signature, expiry, not signed out,
 * account still active, password not changed since) and the role, and puts who is asking on `res.locals.auth`.
 */
export function allow(access: Access, options: { accepts?: 'json' | 'multipart' } = {}): RequestHandler {
  const handler: RequestHandler = async (req, res, next) => {
    assertBodyType(req, options.accepts ?? 'json');
    if (access === 'public') return next();
    const token = tokenFrom(req);
    const auth = token ? await authenticateToken(token) : null;
    if (!auth) throw unauthorized();
    if (access !== 'signed-in' && !can(auth.role, access)) throw forbidden();
    res.locals.auth = auth;
    next();
  };
  return Object.assign(handler, { [ACCESS]: access });
}

/** Who is asking on a public route, when a valid session comes with the request. */
export async function optionalAuth(req: Parameters<RequestHandler>[0]): Promise<AuthContext | undefined> {
  const token = tokenFrom(req);
  return (token && (await authenticateToken(token))) || undefined;
}

/** Who is asking, on a route guarded by `allow` (anything but public). */
export function authOf(res: { locals: { auth?: AuthContext } }): AuthContext {
  if (!res.locals.auth) throw unauthorized();
  return res.locals.auth;
}
