import { main } from '@/server/index';
import { logger } from '@/server/logger';

import { buildWeb, webBuildIsStale } from './build-web';

/** `npm start`: build the web app when it is missing or stale, then serve it with the API. */
async function start(): Promise<void> {
  if (webBuildIsStale()) await buildWeb();
  await main();
}

start().catch((error: unknown) => {
  logger.fatal({ err: error }, 'Fizzwright could not start');
  process.exit(1);
});
