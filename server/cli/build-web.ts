import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

import { FONT_WEIGHTS, fontFileName, FONTS_PATH } from '@/lib/web-fonts';
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
 * The export's index.html made ready for a slow phone: the regular weight's core part preloaded (the rest follow
 * when text needs them), and the 1 KB PNG icon instead of the 15 KB favicon.ico Expo writes.
 */
export function finishIndexHtml(distDir: string): void {
  const index = path.join(distDir, 'index.html');
  const regular = `${FONTS_PATH}/${fontFileName(FONT_WEIGHTS[0].slug, 'core')}`;
  const preload = `<link rel="preload" href="${regular}" as="font" type="font/woff2" crossorigin>`;
  fs.copyFileSync(path.join(ROOT_DIR, 'assets', 'favicon.png'), path.join(distDir, 'favicon.png'));
  fs.rmSync(path.join(distDir, 'favicon.ico'), { force: true });
  const html = fs
    .readFileSync(index, 'utf8')
    .replace('<link rel="icon" href="/favicon.ico" />', '<link rel="icon" type="image/png" href="/favicon.png">')
    .replace('</title>', `</title>\n    ${preload}`);
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
