// Runs before each server test file: a fresh database of its own, fast hashing, quiet logs, no demo data.
import { execFileSync } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';

import { pgTestPrefix } from './pg-names';

process.env.NODE_ENV = 'test';
process.env.DATABASE_PATH = path.join(
  os.tmpdir(),
  `fizzwright-test-${process.pid}-${Date.now()}-${Math.random().toString(36).slice(2)}.sqlite`,
);
process.env.BCRYPT_COST = '4';
process.env.AUTH_RATE_LIMIT = process.env.AUTH_RATE_LIMIT_FOR_TEST ?? '10000';
process.env.AUTH_ACCOUNT_RATE_LIMIT = '10000';
process.env.AUTH_RESPONSE_FLOOR_MS = '0';
process.env.SEED_DEMO = 'false';
process.env.APP_URL = 'http://fizzwright.test';
process.env.SMTP_URL = '';
process.env.UPLOADS_DIR = path.join(
  os.tmpdir(),
  `fizzwright-uploads-${process.pid}-${Math.random().toString(36).slice(2)}`,
);
process.env.UPLOAD_MAX_MB = '1';

/*
 * `npm run test:pg` (TEST_PG=true): the same tests against PostgreSQL. TEST_DATABASE_URL names a database the test
 * role may connect to with CREATEDB; each test file gets a fresh database of its own (dropped by pg-teardown.ts), as each gets its own
 * SQLite file otherwise. Made synchronously here because Jest's setup files cannot wait.
 */
if (process.env.TEST_PG === 'true' && process.env.TEST_DATABASE_URL) {
  const admin = new URL(process.env.TEST_DATABASE_URL);
  const name = `${pgTestPrefix()}${process.pid}_${Date.now()}_${Math.random().toString(36).slice(2, 8)}`;
  execFileSync(process.execPath, [
    '-e',
    `const { Client } = require('pg');
     const client = new Client({ connectionString: process.argv[1] });
     client.connect().then(() => client.query('CREATE DATABASE ${name}')).then(() => client.end(), (e) => { console.error(e.message); process.exit(1); });`,
    admin.toString(),
  ]);
  const url = new URL(admin);
  url.pathname = `/${name}`;
  process.env.DATABASE_URL = url.toString();
  process.env.JWT_SECRET = 'test-secret-for-postgres-runs-only-0123456789';
}

// The AWS SDK's notice about Node 22 (see server/services/object-store.ts), once per test file otherwise.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
