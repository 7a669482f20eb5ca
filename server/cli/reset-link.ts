import { email as emailSchema } from '@/lib/schemas/common';
import { config } from '@/server/config';
import { prepareDatabase, sequelize } from '@/server/db';
import { consoleLink } from '@/server/services/auth';

/**
 * `npm run reset-link -- <email>`, on the server's own console: prints a one-time link for an address when no
 * e-mail can reach it (a server without SMTP). A password reset link (1 hour) for an active account, or a fresh
 * confirmation link for a sign-up still waiting. Whoever can run this can already read the database.
 */
async function run(): Promise<void> {
  const given = process.argv[2];
  let address: string;
  try {
    address = await emailSchema().validate(given);
  } catch {
    console.error('Usage: npm run reset-link -- <e-mail address of the account>');
    process.exit(2);
  }
  await prepareDatabase();
  const link = await consoleLink(address);
  await sequelize.close();
  if (!link) {
    console.error(`No active account and no waiting sign-up uses ${address} (database ${config.databasePath}).`);
    process.exit(1);
  }
  console.log(
    link.kind === 'reset'
      ? `One-time link to choose a new password for ${address} (works for 1 hour):`
      : `One-time link to confirm the sign-up of ${address} (works for 24 hours):`,
  );
  console.log(link.url);
}

run().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
