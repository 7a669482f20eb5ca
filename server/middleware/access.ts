import type { RequestHandler } from 'express';

import type { Role } from '../../lib/roles';
import { forbidden, unauthorized } from '../errors';
import { authenticateToken, SESSION_COOKIE, type AuthContext } from '../services/sessions';

/** Who may call a route: anyone, any signed-in member, or members with one of the listed roles. */
export type Access = 'public' | 'signed-in' | readonly Role[];

declare global {
  namespace Express {
    interface Locals {
      auth?: AuthContext;
    }
  }
}

/** Marks the middleware made by `allow`, so a test can prove every route declares its access. */
export const ACCESS = Symbol('access');

function tokenFrom(req: Parameters<RequestHandler>[0]): string | undefined {
  const cookie = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  if (cookie) return cookie;
  const header = req.headers.authorization;
  return header?.startsWith('Bearer ') ? header.slice(7) : undefined;
}

/**
 * The first handler of every API route. Checks the session (signature, expiry, account still active, password
 * not changed since) and the role, and puts who is asking on `res.locals.auth`.
 */
export function allow(access: Access): RequestHandler {
  const handler: RequestHandler = async (req, res, next) => {
    if (access === 'public') return next();
    const token = tokenFrom(req);
    const auth = token ? await authenticateToken(token) : null;
    if (!auth) throw unauthorized();
    if (access !== 'signed-in' && !access.includes(auth.role)) throw forbidden();
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
