import type { Request, Response } from 'express';
import { rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';

import { config } from '@/server/config';
import { HttpError } from '@/server/errors';
import { hashToken } from '@/server/services/tokens';

const tooMany = (next: (error: unknown) => void) =>
  next(new HttpError(429, 'too_many_requests', 'Too many attempts. Wait a few minutes and try again.'));

/**
 * Per client address: sign-in, sign-up and the one-time links, AUTH_RATE_LIMIT a minute. The address is the
 * connection's unless TRUST_PROXY says which proxy to believe (Express's `trust proxy`, set in app.ts).
 */
export function perAddressLimit(): RateLimitRequestHandler {
  return rateLimit({
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
