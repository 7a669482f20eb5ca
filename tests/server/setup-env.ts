// Runs before each server test file: a fresh SQLite file of its own, fast hashing, quiet logs, no demo data.
import os from 'node:os';
import path from 'node:path';

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
