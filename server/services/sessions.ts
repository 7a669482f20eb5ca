import crypto from 'node:crypto';

import type { CookieOptions } from 'express';
import jwt from 'jsonwebtoken';

import type { Role } from '../../lib/roles';
import { config } from '../config';
import { User } from '../models/user';

export const SESSION_COOKIE = 'fw_session';

/** Who is asking, as the server knows it on every signed-in request. */
export interface AuthContext {
  userId: number;
  organisationId: number;
  role: Role;
}

interface TokenClaims {
  sub: string;
  tv: number;
}

interface CachedUser extends AuthContext {
  active: boolean;
  tokenVersion: number;
}

/**
 * Users looked up by the sign-in check, kept in memory so that a signed-in request costs no query. Any change
 * to a user row clears its entry (hooks in db.ts), so a deactivation or role change takes effect at once.
 */
const userCache = new Map<number, CachedUser>();

export function forgetCachedUser(userId?: number): void {
  if (userId === undefined) userCache.clear();
  else userCache.delete(userId);
}

async function lookUpUser(userId: number): Promise<CachedUser | null> {
  const cached = userCache.get(userId);
  if (cached) return cached;
  const user = await User.findByPk(userId, { attributes: ['id', 'organisationId', 'role', 'active', 'tokenVersion'] });
  if (!user) return null;
  const entry: CachedUser = {
    userId: user.id,
    organisationId: user.organisationId,
    role: user.role,
    active: user.active,
    tokenVersion: user.tokenVersion,
  };
  userCache.set(userId, entry);
  return entry;
}

/**
 * The signing key as a KeyObject made once: given a string, jsonwebtoken builds a KeyObject on every call, which
 * was a fifth of the server's time under load.
 */
const signingKey = crypto.createSecretKey(Buffer.from(config.jwtSecret, 'utf8'));

/** Signs a session token for a user (HS256, expires after the configured lifetime). */
export function signSessionToken(user: Pick<User, 'id' | 'tokenVersion'>): string {
  const claims: TokenClaims = { sub: String(user.id), tv: user.tokenVersion };
  return jwt.sign(claims, signingKey, { algorithm: 'HS256', expiresIn: config.sessionTtlSeconds });
}

/**
 * Tokens already verified, by their exact text: verifying the same string again can only give the same claims, so
 * only the expiry is checked on a repeat. Bounded; the oldest entries go first.
 */
const verified = new Map<string, TokenClaims & { exp: number }>();
const VERIFIED_MAX = 5000;

function verifyToken(token: string): TokenClaims | null {
  const known = verified.get(token);
  if (known) {
    if (known.exp * 1000 > Date.now()) return known;
    verified.delete(token);
    return null;
  }
  try {
    const claims = jwt.verify(token, signingKey, { algorithms: ['HS256'] }) as TokenClaims & { exp: number };
    if (verified.size >= VERIFIED_MAX) verified.delete(verified.keys().next().value as string);
    verified.set(token, claims);
    return claims;
  } catch {
    return null;
  }
}

/** Checks a session token and the account behind it. Returns null for anything that is not a valid session. */
export async function authenticateToken(token: string): Promise<AuthContext | null> {
  const claims = verifyToken(token);
  if (!claims) return null;
  const userId = Number(claims.sub);
  if (!Number.isInteger(userId)) return null;
  const user = await lookUpUser(userId);
  if (!user || !user.active || user.tokenVersion !== claims.tv) return null;
  return { userId: user.userId, organisationId: user.organisationId, role: user.role };
}

/** The session cookie: httpOnly so scripts never see it, SameSite=Lax so links from e-mails still work. */
export function sessionCookieOptions(): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'lax',
    secure: config.appUrl.startsWith('https://'),
    path: '/',
    maxAge: config.sessionTtlSeconds * 1000,
  };
}
