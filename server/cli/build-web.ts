import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

import { ROOT_DIR } from '@/server/config';

/** What the web bundle is built from: a change to any of these makes the export stale. */
const SOURCES = [
  'app',
  'components',
  'lib',
  'assets',
  'app.json',
  'babel.config.js',
  'package.json',
  'package-lock.json',
];

function newestMtime(target: string): number {
  if (!fs.existsSync(target)) return 0;
  const stat = fs.statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(target)) newest = Math.max(newest, newestMtime(path.join(target, entry)));
  return newest;
}

/** True when dist/index.html is missing or older than any source of the web app. */
export function webBuildIsStale(distDir = path.join(ROOT_DIR, 'dist')): boolean {
  const index = path.join(distDir, 'index.html');
  if (!fs.existsSync(index)) return true;
  const built = fs.statSync(index).mtimeMs;
  return SOURCES.some((source) => newestMtime(path.join(ROOT_DIR, source)) > built);
}

/** Exports the web app to dist/ with Expo (offline). Exits the process when the export fails. */
export function buildWeb(): void {
  console.log('Building the web app (expo export --platform web), about half a minute...');
  const started = Date.now();
  const result = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist', '--clear'], {
    cwd: ROOT_DIR,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) {
    console.error('The web export failed; see the messages above.');
    process.exit(result.status ?? 1);
  }
  console.log(`Web app built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}

if (require.main === module) {
  if (process.argv.includes('--force') || webBuildIsStale()) buildWeb();
  else console.log('The web app in dist/ is up to date.');
}
