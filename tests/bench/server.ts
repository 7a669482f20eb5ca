import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export const ROOT = path.resolve(__dirname, '../..');

/**
 * The server in its own process, as in production (NODE_ENV=production, logs at warn), on a temporary database
 * with the demo brewery, listening on a free loopback port. `extraEnv` adds to its environment.
 */
export async function startServer(
  extraEnv: Record<string, string> = {},
): Promise<{ child: ChildProcess; url: string; dir: string }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-bench-'));
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: '0',
      HOST: '127.0.0.1',
      DATABASE_PATH: path.join(dir, 'bench.sqlite'),
      AUTH_RATE_LIMIT: '100000',
      AUTH_ACCOUNT_RATE_LIMIT: '100000',
      LOG_LEVEL: 'warn',
      SEED_DEMO: 'true',
      ...extraEnv,
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const url = await new Promise<string>((resolve, reject) => {
    let out = '';
    child.stdout!.on('data', (chunk: Buffer) => {
      out += chunk.toString();
      const match = /listening on (http:\/\/localhost:\d+)/.exec(out);
      if (match) resolve(match[1].replace('localhost', '127.0.0.1'));
    });
    child.on('exit', (code) => reject(new Error(`server exited with ${code}\n${out}`)));
  });
  return { child, url, dir };
}

/** Signs the demo owner in; answers the session cookie ("fw_session=…"). */
export async function signIn(url: string): Promise<string> {
  const res = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'imogen@wrenfield.example', password: 'wrenfield-owner' }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0];
}

export const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
