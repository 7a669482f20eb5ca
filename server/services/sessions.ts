import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import type { CookieOptions } from 'express';
import jwt from 'jsonwebtoken';
import { LRUCache } from 'lru-cache';
import { Op } from 'sequelize';

import type { Role } from '@/lib/roles';
import { config } from '@/server/config';
import { RevokedSession } from '@/server/models/revoked-session';
import { User } from '@/server/models/user';

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
  /** This token's own id, so that signing out can end this one session and no other. */
  jti: string;
}

interface CachedUser extends AuthContext {
  active: boolean;
  tokenVersion: number;
}

/**
 * Users looked up by the sign-in check, kept in memory so that a signed-in request costs no query. Any change
 * to a user row clears its entry here (hooks in db.ts), so a deactivation or role change takes effect at once on
 * this instance; other instances sharing the database see it within `config.cacheTtlMs`.
 */
const userCache = new LRUCache<number, CachedUser>({ max: 10_000, ttl: Math.max(config.cacheTtlMs, 1) });

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
 * The secret that signs sessions: JWT_SECRET when set, otherwise 32 random bytes made at first start and kept
 * beside the database (mode 0600), so that no secret is written in the source and a restart keeps people signed in.
 * Never printed or logged.
 */
export function readOrCreateSecretFile(file: string): Buffer {
  try {
    const existing = fs.readFileSync(file, 'utf8').trim();
    if (existing.length >= 64) {
      if ((fs.statSync(file).mode & 0o077) !== 0) fs.chmodSync(file, 0o600);
      return Buffer.from(existing, 'hex');
    }
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const secret = crypto.randomBytes(32).toString('hex');
  try {
    fs.writeFileSync(file, `${secret}\n`, { flag: 'wx', mode: 0o600 });
  } catch (error) {
    // Another process made it first (two test files, or two starts at once): use theirs.
    if ((error as NodeJS.ErrnoException).code === 'EEXIST') return readOrCreateSecretFile(file);
    throw error;
  }
  return Buffer.from(secret, 'hex');
}

let signingKey: crypto.KeyObject | null = null;

/**
 * The signing key as a KeyObject made once: given a string, jsonwebtoken builds a KeyObject on every call, which
 * was a fifth of the server's time under load.
 */
export function sessionSigningKey(): crypto.KeyObject {
  signingKey ??= crypto.createSecretKey(
    config.jwtSecret ? Buffer.from(config.jwtSecret, 'utf8') : readOrCreateSecretFile(config.sessionSecretFile),
  );
  return signingKey;
}

/** Signs a session token for a user (HS256, expires after the configured lifetime). */
export function signSessionToken(user: Pick<User, 'id' | 'tokenVersion'>): string {
  const claims: TokenClaims = {
    sub: String(user.id),
    tv: user.tokenVersion,
    jti: crypto.randomBytes(12).toString('base64url'),
  };
  return jwt.sign(claims, sessionSigningKey(), { algorithm: 'HS256', expiresIn: config.sessionTtlSeconds });
}

/**
 * Tokens already verified, by their exact text: verifying the same string again can only give the same claims, so
 * only the expiry is checked on a repeat. Bounded; the oldest entries go first.
 */
const verified = new Map<string, TokenClaims & { exp: number }>();
const VERIFIED_MAX = 5000;

function verifyToken(token: string): (TokenClaims & { exp: number }) | null {
  const known = verified.get(token);
  if (known) {
    if (known.exp * 1000 > Date.now()) return known;
    verified.delete(token);
    return null;
  }
  try {
    const claims = jwt.verify(token, sessionSigningKey(), { algorithms: ['HS256'] }) as TokenClaims & { exp: number };
    if (typeof claims.jti !== 'string' || typeof claims.tv !== 'number') return null;
    if (verified.size >= VERIFIED_MAX) verified.delete(verified.keys().next().value as string);
    verified.set(token, claims);
    return claims;
  } catch {
    return null;
  }
}

/**
 * Sessions ended by signing out, by token id, until the token would have expired anyway. Kept in the database so a
 * restart does not bring them back, and in memory (loaded once) so the check costs no query.
 */
let revoked: Promise<Map<string, number>> | null = null;
let revokedLoadedAt = 0;

function revokedSessions(): Promise<Map<string, number>> {
  // Another instance may have ended a session: read the list again once it is older than the cache lifetime.
  if (revoked && Date.now() - revokedLoadedAt > config.cacheTtlMs) revoked = null;
  if (!revoked) revokedLoadedAt = Date.now();
  revoked ??= (async () => {
    await RevokedSession.destroy({ where: { expiresAt: { [Op.lt]: new Date() } } });
    const rows = await RevokedSession.findAll();
    return new Map(rows.map((row) => [row.jti, row.expiresAt.getTime()]));
  })().catch((error: unknown) => {
    revoked = null;
    throw error;
  });
  return revoked;
}

/** Forgets what was loaded, for a new database (tests). */
export function forgetRevokedSessions(): void {
  revoked = null;
  verified.clear();
}

/** Ends the session of this token (sign-out): the same token is refused from now on, even after a restart. */
export async function revokeToken(token: string): Promise<void> {
  const claims = verifyToken(token);
  if (!claims) return;
  const expiresAt = new Date(claims.exp * 1000);
  await RevokedSession.findOrCreate({ where: { jti: claims.jti }, defaults: { jti: claims.jti, expiresAt } });
  (await revokedSessions()).set(claims.jti, expiresAt.getTime());
  verified.delete(token);
}

/** Checks a session token and the account behind it. Returns null for anything that is not a valid session. */
export async function authenticateToken(token: string): Promise<AuthContext | null> {
  const claims = verifyToken(token);
  if (!claims) return null;
  if ((await revokedSessions()).has(claims.jti)) return null;
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
