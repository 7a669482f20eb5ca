import { execFileSync } from 'node:child_process';
import path from 'node:path';

import type { Page } from '@playwright/test';

export const PHONE = { width: 390, height: 844 };
export const WIDE = { width: 1440, height: 900 };

/** An address on the server global-setup started. */
export const url = (path: string) => `${process.env.E2E_BASE_URL}${path}`;

export const shot = (page: Page, name: string) =>
  page.screenshot({ path: `${__dirname}/screenshots/${name}.png`, fullPage: true });

export async function signIn(page: Page, email: string, password: string) {
  await page.goto(url('/sign-in'));
  await page.getByLabel('E-mail', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Opens a destination of the shell: from the rail or tab bar, or through "More" when the phone bar has no room for it. */
export async function openNav(page: Page, label: string) {
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  const link = page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: label, exact: true });
  if ((await link.count()) > 0) {
    await link.first().click();
    return;
  }
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'More', exact: true }).click();
  await page.getByRole('button', { name: label, exact: true }).click();
}

/**
 * The one-time link for an address, printed the way whoever runs a server without SMTP gets it:
 * `npm run reset-link -- <email>` against the server's database. Answers the path of the link.
 */
export function consoleLink(email: string): string {
  const out = execFileSync(process.execPath, ['--import', 'tsx', 'server/cli/reset-link.ts', email], {
    cwd: path.resolve(__dirname, '../..'),
    env: {
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_PATH: path.join(process.env.E2E_DATA_DIR!, 'e2e.sqlite'),
      LOG_LEVEL: 'warn',
      SEED_DEMO: 'false',
      APP_URL: process.env.E2E_BASE_URL,
    },
    encoding: 'utf8',
  });
  const match = /https?:\/\/[^/\s]+(\/\S+)/.exec(out);
  if (!match) throw new Error(`no link printed for ${email}:\n${out}`);
  return match[1];
}
