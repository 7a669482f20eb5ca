// After `npm run test:pg`: drops the databases each test file made (see setup-env.ts).
import { Client } from 'pg';

import { PG_TEST_PREFIX } from './pg-names';

export default async function dropTestDatabases(): Promise<void> {
  if (process.env.TEST_PG !== 'true' || !process.env.TEST_DATABASE_URL) return;
  const client = new Client({ connectionString: process.env.TEST_DATABASE_URL });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>(
      'SELECT datname FROM pg_database WHERE starts_with(datname, $1)',
      [PG_TEST_PREFIX],
    );
    for (const { datname } of rows) await client.query(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
  } finally {
    await client.end();
  }
}
