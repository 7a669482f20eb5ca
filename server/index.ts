import type { AddressInfo } from 'node:net';

import { createApp } from './app';
import { config } from './config';
import { prepareDatabase } from './db';
import { logger } from './logger';
import { demoAccountsText, seedDemoIfEmpty } from './seed/demo';
import { seedDemoRecipesIfEmpty } from './seed/demo-recipes';
import { seedIngredientsIfEmpty } from './seed/ingredients';
import { removeOrphanUploads } from './services/attachments';
import { closeObjectStore } from './services/object-store';
import { redactExpiredLinks } from './services/outbox';
import { sessionSigningKey } from './services/sessions';

/** Which database this instance uses, for the start-up line: never the password. */
function databaseDescription(): string {
  if (!config.databaseUrl) return config.databasePath;
  const url = new URL(config.databaseUrl);
  return `PostgreSQL ${url.hostname}:${url.port || 5432}${url.pathname}`;
}

/** Prepares the database (migrations, demo data on first start) and listens. Resolves with the bound port. */
export async function main(): Promise<number> {
  await prepareDatabase();
  // Made (or read) now, so the first start leaves the secret beside the database rather than at the first sign-in.
  sessionSigningKey();
  await removeOrphanUploads();
  await redactExpiredLinks();
  // The demo passwords are published in the README: printed only when the accounts were just made.
  if (config.seedDemo && (await seedDemoIfEmpty())) console.log(`\n${demoAccountsText()}\n`);
  const ingredients = await seedIngredientsIfEmpty();
  if (ingredients) console.log(ingredients);
  if (config.seedDemo) await seedDemoRecipesIfEmpty();
  const app = createApp();
  return new Promise((resolve) => {
    const server = app.listen(config.port, config.host, () => {
      const { port } = server.address() as AddressInfo;
      if (!config.appUrlConfigured) config.appUrl = `http://localhost:${port}`;
      console.log(`Fizzwright is listening on http://localhost:${port} (database ${databaseDescription()})`);
      resolve(port);
    });
    const stop = () =>
      server.close(() => {
        void closeObjectStore().finally(() => process.exit(0));
      });
    process.once('SIGINT', stop);
    process.once('SIGTERM', stop);
  });
}

if (require.main === module) {
  main().catch((error: unknown) => {
    logger.fatal({ err: error }, 'Fizzwright could not start');
    process.exit(1);
  });
}
