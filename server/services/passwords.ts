import bcrypt from 'bcryptjs';

import { config } from '@/server/config';

/** bcrypt hash at the configured cost (12 by default, about a quarter of a second here). */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, config.bcryptCost);
}

export function checkPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/**
 * A hash to compare against when the e-mail is unknown, so that a wrong e-mail takes as long as a wrong
 * password and the answer's timing does not tell whether an account exists.
 */
let decoyHash: Promise<string> | null = null;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= bcrypt.hash('decoy-password-never-used', config.bcryptCost);
  return decoyHash;
}
