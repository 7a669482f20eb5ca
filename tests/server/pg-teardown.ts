// After `npm run test:pg`: drops the databases each test file made (see setup-env.ts).
import { Client } from 'pg';

import { pgTestPrefix } from './pg-names';

/**
 * Drops a database, ending its sessions first. PostgreSQL refuses to end a session of another role (an autovacuum
 * worker that has just started there): then it waits a moment and drops it plainly, and at worst leaves it, saying so.
 */
export async function dropDatabase(client: Client, name: string): Promise<void> {
  for (let attempt = 0; attempt < 5; attempt++) {
    try {
      await client.query(`DROP DATABASE IF EXISTS "${name}"${attempt === 0 ? ' WITH (FORCE)' : ''}`);
      return;
    } catch {
      await new Promise((resolve) => setTimeout(resolve, 500));
    }
  }
  console.warn(`Could not drop the test database ${name}; drop it by hand.`);
}

export default async function dropTestDatabases(): Promise<void> {
  if (process.env.TEST_PG !== 'true' || !process.env.TEST_DATABASE_URL) return;
  const client = new Client({ connectionString: process.env.TEST_DATABASE_URL });
  await client.connect();
  try {
    const { rows } = await client.query<{ datname: string }>(
      'SELECT datname FROM pg_database WHERE starts_with(datname, $1)',
      [pgTestPrefix()],
    );
    for (const { datname } of rows) await dropDatabase(client, datname);
  } finally {
    await client.end();
  }
}
