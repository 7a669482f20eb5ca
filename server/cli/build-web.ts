import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

import { ROOT_DIR } from '@/server/config';

import { buildFonts } from './build-fonts';

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

/** Files worth compressing: text. WOFF2 and PNG are compressed already. */
const COMPRESSIBLE = /\.(js|css|html|json|svg|txt|map|ico)$/;

function filesUnder(dir: string): string[] {
  return fs
    .readdirSync(dir, { withFileTypes: true })
    .flatMap((entry) => (entry.isDirectory() ? filesUnder(path.join(dir, entry.name)) : [path.join(dir, entry.name)]));
}

/**
 * Brotli (quality 11) and gzip (level 9) copies beside every text file of the export, made once here so that the
 * server sends them as they are (server/web.ts) instead of compressing each request.
 */
export function precompress(distDir: string): void {
  for (const file of filesUnder(distDir).filter((f) => COMPRESSIBLE.test(f))) {
    const body = fs.readFileSync(file);
    fs.writeFileSync(
      `${file}.br`,
      zlib.brotliCompressSync(body, {
        params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length },
      }),
    );
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(body, { level: 9 }));
  }
}

/**
 * The export's index.html made ready for a slow phone: the 1 KB PNG icon instead of the 15 KB favicon.ico Expo writes.
 * The typeface is not preloaded: on the phone profile of `npm run bench:web` a preload of the regular weight (19 KB)
 * shares the line with the bundle and made the sign-in screen usable about 0.09 s later (median of 15 alternating
 * rounds, 2026-12-03); `font-display: swap` draws the page at once in the fallback face and swaps the font in.
 */
export function finishIndexHtml(distDir: string): void {
  const index = path.join(distDir, 'index.html');
  fs.copyFileSync(path.join(ROOT_DIR, 'assets', 'favicon.png'), path.join(distDir, 'favicon.png'));
  fs.rmSync(path.join(distDir, 'favicon.ico'), { force: true });
  const html = fs
    .readFileSync(index, 'utf8')
    .replace('<link rel="icon" href="/favicon.ico" />', '<link rel="icon" type="image/png" href="/favicon.png">');
  fs.writeFileSync(index, html);
}

/**
 * Exports the web app to dist/ with Expo (offline): the font subsets first (public/fonts), then the export, then
 * index.html and the precompressed copies. Exits the process when the export fails.
 */
export async function buildWeb(): Promise<void> {
  console.log('Building the web app (expo export --platform web), about a minute...');
  const started = Date.now();
  await buildFonts();
  const result = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist', '--clear'], {
    cwd: ROOT_DIR,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) {
    console.error('The web export failed; see the messages above.');
    process.exit(result.status ?? 1);
  }
  const distDir = path.join(ROOT_DIR, 'dist');
  finishIndexHtml(distDir);
  precompress(distDir);
  console.log(`Web app built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}

if (require.main === module) {
  if (process.argv.includes('--force') || webBuildIsStale())
    buildWeb().catch((error: unknown) => {
      console.error(error);
      process.exit(1);
    });
  else console.log('The web app in dist/ is up to date.');
}
