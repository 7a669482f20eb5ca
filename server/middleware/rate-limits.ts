import type { Request, Response } from 'express';
import {
  type IncrementResponse,
  type Options,
  rateLimit,
  type RateLimitRequestHandler,
  type Store,
} from 'express-rate-limit';

import { config } from '@/server/config';
import { sequelize } from '@/server/db';
import { HttpError } from '@/server/errors';
import { hashToken } from '@/server/services/tokens';

const tooMany = (next: (error: unknown) => void) =>
  next(new HttpError(429, 'too_many_requests', 'Too many attempts. Wait a few minutes and try again.'));

/**
 * The counter of one limit when instances share PostgreSQL: a row per key in `rate_limit_hits`, counted up in one
 * statement (a window that has ended starts again at 1), so every instance sees the same count. Runs on the app's
 * own connection pool; rows of ended windows are removed now and then.
 */
class SharedCounter implements Store {
  readonly prefix: string;
  private windowMs = 60_000;
  private increments = 0;

  constructor(name: string) {
    this.prefix = `${name}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  /** The row's key: the limit's name and the client's key, hashed when long (an e-mail field can hold anything). */
  private rowKey(key: string): string {
    return this.prefix + (key.length > 200 ? hashToken(key) : key);
  }

  async increment(key: string): Promise<IncrementResponse> {
    if (++this.increments % 500 === 0)
      await sequelize.query('DELETE FROM rate_limit_hits WHERE reset_at < now()').catch(() => undefined);
    const [rows] = (await sequelize.query(
      `INSERT INTO rate_limit_hits (key, hits, reset_at)
       VALUES (:key, 1, now() + :windowMs * interval '1 millisecond')
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.rowKey(key), windowMs: this.windowMs } },
    )) as [{ hits: number; reset_at: Date }[], unknown];
    return { totalHits: rows[0].hits, resetTime: new Date(rows[0].reset_at) };
  }

  async decrement(key: string): Promise<void> {
    await sequelize.query('UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = :key', {
      replacements: { key: this.rowKey(key) },
    });
  }

  async resetKey(key: string): Promise<void> {
    await sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', { replacements: { key: this.rowKey(key) } });
  }
}

/** Where a limit counts: in this process (one machine), or in PostgreSQL, shared by every instance. */
const counterFor = (name: string): { store?: Store } => (config.databaseUrl ? { store: new SharedCounter(name) } : {});

/**
 * Per client address: sign-in, sign-up and the one-time links, AUTH_RATE_LIMIT a minute. The address is the
 * connection's unless TRUST_PROXY says which proxy to believe (Express's `trust proxy`, set in app.ts).
 */
export function perAddressLimit(name: string): RateLimitRequestHandler {
  return rateLimit({
    ...counterFor(`address-${name}`),
    windowMs: 60_000,
    limit: config.authRateLimitPerMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Forwarded headers from an untrusted proxy are ignored on purpose; README, "Running it for real".
    validate: { xForwardedForHeader: false },
    handler: (_req, _res, next) => tooMany(next),
  });
}

const bodyText = (req: Request, field: string): string | undefined => {
  const value = (req.body as Record<string, unknown> | undefined)?.[field];
  return typeof value === 'string' && value.trim() ? value.trim().toLowerCase() : undefined;
};

/** What identifies the account an attempt is aimed at. */
export const accountKeys = {
  email: (req: Request) => bodyText(req, 'email'),
  bodyToken: (req: Request) => (bodyText(req, 'token') ? hashToken(bodyText(req, 'token')!) : undefined),
  paramToken: (req: Request) => (typeof req.params.token === 'string' ? hashToken(req.params.token) : undefined),
  signedIn: (_req: Request, res: Response) => (res.locals.auth ? `user-${res.locals.auth.userId}` : undefined),
};

/**
 * Per account, whatever address the attempts come from: AUTH_ACCOUNT_RATE_LIMIT in 15 minutes for one e-mail
 * address, one link or one signed-in person. Successful sign-ins do not count, so the owner of an account is not
 * locked out by their own use of it.
 */
export function perAccountLimit(
  name: string,
  keyOf: (req: Request, res: Response) => string | undefined,
  options: { countSuccess?: boolean } = {},
): RateLimitRequestHandler {
  return rateLimit({
    ...counterFor(`account-${name}`),
    windowMs: 15 * 60_000,
    limit: config.authAccountRateLimit,
    standardHeaders: false,
    legacyHeaders: false,
    skipSuccessfulRequests: options.countSuccess === false,
    skip: (req, res) => keyOf(req, res) === undefined,
    keyGenerator: (req, res) => `${name}:${keyOf(req, res)}`,
    validate: { xForwardedForHeader: false, keyGeneratorIpFallback: false },
    handler: (_req, _res, next) => tooMany(next),
  });
}
