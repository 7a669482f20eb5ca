import crypto from 'node:crypto';

/** A one-time token for a link in an e-mail (256 random bits, URL-safe), and the hash that is stored. */
export function newOneTimeToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

/** SHA-256 of a one-time token: the database never holds a usable link. */
export function hashToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}

export const DAY_MS = 24 * 60 * 60 * 1000;
export const HOUR_MS = 60 * 60 * 1000;
