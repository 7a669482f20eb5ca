import { Organisation, transaction, User } from '@/server/db';
import { logger } from '@/server/logger';
import { seedStarterFormats } from '@/server/services/bottle-formats';
import { hashPassword } from '@/server/services/passwords';

/**
 * The demo scenario: Wrenfield Cultured Drinks, an invented four-person brewery. Names, addresses and
 * passwords are made up; the addresses use the reserved .example domain (RFC 2606), so no mail can reach anyone.
 */
export const DEMO_BREWERY = 'Wrenfield Cultured Drinks';
export const DEMO_ACCOUNTS = [
  { role: 'owner', name: 'Imogen Thale', email: 'imogen@wrenfield.example', password: 'wrenfield-owner' },
  { role: 'developer', name: 'Rafi Castellan', email: 'rafi@wrenfield.example', password: 'wrenfield-developer' },
  { role: 'brewer', name: 'Juno Marsh', email: 'juno@wrenfield.example', password: 'wrenfield-brewer' },
] as const;

/** Seeds the demo brewery when the database has no brewery yet. Answers whether it did. */
export async function seedDemoIfEmpty(): Promise<boolean> {
  if ((await Organisation.count()) > 0) return false;
  const hashes = await Promise.all(DEMO_ACCOUNTS.map((account) => hashPassword(account.password)));
  await transaction(async (transaction) => {
    const brewery = await Organisation.create({ name: DEMO_BREWERY, lotPrefix: 'WCD' }, { transaction });
    await seedStarterFormats(brewery.id, transaction);
    for (const [i, account] of DEMO_ACCOUNTS.entries()) {
      await User.create(
        {
          organisationId: brewery.id,
          email: account.email,
          name: account.name,
          role: account.role,
          passwordHash: hashes[i],
        },
        { transaction },
      );
    }
  });
  logger.info('demo brewery seeded');
  return true;
}

export function demoAccountsText(): string {
  return [
    `Demo brewery "${DEMO_BREWERY}" created. Sign in with:`,
    ...DEMO_ACCOUNTS.map((a) => `  ${a.role.padEnd(10)} ${a.email.padEnd(28)} ${a.password}`),
  ].join('\n');
}
