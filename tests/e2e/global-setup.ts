import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');

/** Starts the real server on a free port with a fresh database and hands its address to the tests. */
export default async function globalSetup(): Promise<void> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-e2e-'));
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: '0',
      HOST: '127.0.0.1',
      DATABASE_PATH: path.join(dir, 'e2e.sqlite'),
      UPLOADS_DIR: path.join(dir, 'uploads'),
      BCRYPT_COST: '4',
      AUTH_RATE_LIMIT: '10000',
      OUTBOX_OPEN: 'false',
      SEED_DEMO: 'true',
      SMTP_URL: '',
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not start within 60 s')), 60_000);
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      const match = /listening on (http:\/\/localhost:\d+)/.exec(output);
      if (match) {
        clearTimeout(timer);
        resolve(match[1].replace('localhost', '127.0.0.1'));
      }
    });
    child.on('exit', (code) => reject(new Error(`the server exited with ${code}:\n${output}`)));
  });
  process.env.E2E_BASE_URL = url;
  process.env.E2E_SERVER_PID = String(child.pid);
  process.env.E2E_DATA_DIR = dir;
  fs.mkdirSync(path.join(__dirname, 'screenshots'), { recursive: true });
}
