/**
 * `npm run bench:web`: the first load of the sign-in screen on a mid-range phone profile (Chromium with 4× CPU
 * slowdown, 1.6 Mbps down, 750 kbps up, 150 ms round trip), side by side with an empty Expo Router app of the same
 * SDK served the same way, in alternating rounds; then a repeat visit, and the recipe designer signed in. Prints
 * medians, the ratio to the empty app, and the bytes on the wire by resource type.
 *
 * BENCH_WEB_ROUNDS (default 5) sets the rounds; CHROMIUM_PATH the browser (default /usr/bin/chromium);
 * BENCH_WEB_TRACE=1 also prints when each response of the last round's first visits finished.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';

import { type Browser, type BrowserContext, chromium, type Page } from '@playwright/test';
import express from 'express';

import { buildWeb, precompress, webBuildIsStale } from '@/server/cli/build-web';
import { webApp } from '@/server/web';

import { median, ROOT, signIn, startServer } from './server';

const ROUNDS = Number(process.env.BENCH_WEB_ROUNDS ?? 5);
const EMPTY_APP = path.join(ROOT, 'tests/bench/empty-app');
const EMPTY_DIST = path.join(EMPTY_APP, 'dist');

/** The usual mobile test profile: 1.6 Mbps down, 750 kbps up, 150 ms round trip, CPU 4× slower. */
const PROFILE = { latency: 150, downloadThroughput: 1_600_000 / 8, uploadThroughput: 750_000 / 8, cpuSlowdown: 4 };

interface Visit {
  usableMs: number;
  /** When the last script before that arrived: what is left after it is the time to run the code. */
  scriptsDoneMs: number;
  /** Bytes received before the screen was usable, and by the time the network went quiet, by resource type. */
  bytesBeforeUsable: number;
  bytesByType: Record<string, number>;
  totalBytes: number;
  /** Main-thread time spent running script by the time the network went quiet (CDP metrics). */
  scriptMs: number;
  /** Each response: when it finished (ms from the first request) and its bytes on the wire. */
  timeline: { url: string; at: number; bytes: number }[];
}

/** The empty app, exported once, with the same precompressed copies the product's build writes. */
function buildEmptyApp(): void {
  if (fs.existsSync(path.join(EMPTY_DIST, 'index.html'))) return;
  console.log('Building the empty Expo Router app for reference (once)...');
  const result = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist', '--clear'], {
    cwd: EMPTY_APP,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) throw new Error('The empty app did not build.');
  precompress(EMPTY_DIST);
}

/** Serves a web export exactly as the product's server does (server/web.ts), on a free loopback port. */
async function serveStatic(distDir: string): Promise<{ url: string; close: () => void }> {
  const app = express();
  app.use(webApp(distDir));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, close: () => server.close() };
}

/**
 * Records when the first element matching `selector` has a size on screen: checked at every frame (a new element is
 * in the DOM before it is laid out), so the time is that of the first frame that shows it. Written as text: the
 * TypeScript runner would add helpers to a function that the page does not have.
 */
const usableDetector = (selector: string) => `
  (function () {
    function check() {
      var el = document.querySelector(${JSON.stringify(selector)});
      if (el && el.getBoundingClientRect().width > 0) window.__usableAt = performance.now();
      else requestAnimationFrame(check);
    }
    requestAnimationFrame(check);
  })();`;

async function visit(context: BrowserContext, page: Page, url: string): Promise<Visit> {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Performance.enable');
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: PROFILE.latency,
    downloadThroughput: PROFILE.downloadThroughput,
    uploadThroughput: PROFILE.uploadThroughput,
  });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: PROFILE.cpuSlowdown });
  const types = new Map<string, string>();
  const finished: { type: string; bytes: number; at: number; url: string }[] = [];
  const urls = new Map<string, string>();
  let startedAt: number | null = null;
  cdp.on('Network.requestWillBeSent', (e) => {
    if (startedAt === null) startedAt = e.timestamp;
    urls.set(e.requestId, e.request.url);
  });
  cdp.on('Network.responseReceived', (e) => types.set(e.requestId, e.type));
  cdp.on('Network.loadingFinished', (e) =>
    finished.push({
      type: types.get(e.requestId) ?? 'Other',
      bytes: e.encodedDataLength,
      at: e.timestamp,
      url: urls.get(e.requestId) ?? '',
    }),
  );
  await page.goto(url, { waitUntil: 'commit' });
  await page.waitForFunction(() => (window as unknown as { __usableAt?: number }).__usableAt !== undefined, null, {
    timeout: 120_000,
    polling: 50,
  });
  const usableMs = await page.evaluate(() => (window as unknown as { __usableAt: number }).__usableAt);
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(500);
  const { metrics } = await cdp.send('Performance.getMetrics');
  await cdp.detach();
  const bytesByType: Record<string, number> = {};
  for (const f of finished) bytesByType[f.type] = (bytesByType[f.type] ?? 0) + f.bytes;
  const start = startedAt ?? 0;
  const scriptTimes = finished
    .filter((f) => f.type === 'Script')
    .map((f) => (f.at - start) * 1000)
    .filter((ms) => ms <= usableMs);
  return {
    usableMs,
    scriptsDoneMs: scriptTimes.length ? Math.max(...scriptTimes) : 0,
    bytesBeforeUsable: finished.filter((f) => (f.at - start) * 1000 <= usableMs).reduce((s, f) => s + f.bytes, 0),
    bytesByType,
    totalBytes: finished.reduce((s, f) => s + f.bytes, 0),
    scriptMs: (metrics.find((m) => m.name === 'ScriptDuration')?.value ?? 0) * 1000,
    timeline: finished.map((f) => ({
      url: f.url.startsWith('data:') ? f.url.slice(0, f.url.indexOf(';')) : new URL(f.url).pathname,
      at: (f.at - start) * 1000,
      bytes: f.bytes,
    })),
  };
}

/** A first visit in a fresh browser profile, then a repeat visit with its cache. */
async function firstAndRepeat(browser: Browser, url: string, selector: string) {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  await context.addInitScript({ content: usableDetector(selector) });
  const page = await context.newPage();
  const first = await visit(context, page, url);
  const repeat = await visit(context, page, url);
  await context.close();
  return { first, repeat };
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;

async function main(): Promise<void> {
  if (webBuildIsStale()) await buildWeb();
  buildEmptyApp();
  const ours = await startServer();
  const empty = await serveStatic(EMPTY_DIST);
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  try {
    const cookie = await signIn(ours.url);
    const recipes = (await (await fetch(`${ours.url}/api/recipes`, { headers: { cookie } })).json()) as {
      id: number;
    }[];
    const [name, value] = cookie.split('=');
    const results = { ours: [] as Visit[], oursRepeat: [] as Visit[], empty: [] as Visit[], designer: [] as number[] };
    for (let round = 0; round < ROUNDS; round += 1) {
      // Alternate which goes first, so that neither always meets a warmer machine.
      const order = round % 2 === 0 ? ['ours', 'empty'] : ['empty', 'ours'];
      for (const which of order) {
        if (which === 'ours') {
          const { first, repeat } = await firstAndRepeat(browser, `${ours.url}/sign-in`, 'input');
          results.ours.push(first);
          results.oursRepeat.push(repeat);
        } else results.empty.push((await firstAndRepeat(browser, `${empty.url}/`, 'input')).first);
      }
      const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
      await context.addCookies([{ name, value, url: ours.url }]);
      await context.addInitScript({ content: usableDetector('input[aria-label="Residual sugar"]') });
      const page = await context.newPage();
      results.designer.push((await visit(context, page, `${ours.url}/recipes/${recipes[0].id}`)).usableMs);
      await context.close();
      process.stdout.write(`round ${round + 1}/${ROUNDS} done\n`);
    }
    const med = (list: Visit[], key: keyof Omit<Visit, 'bytesByType' | 'timeline'>) => median(list.map((v) => v[key]));
    const oursMs = med(results.ours, 'usableMs');
    const emptyMs = med(results.empty, 'usableMs');
    console.log(
      `\nPhone profile: ${PROFILE.cpuSlowdown}× CPU, ${(PROFILE.downloadThroughput * 8e-6).toFixed(1)} Mbps down, ${(PROFILE.uploadThroughput * 8e-3).toFixed(0)} kbps up, ${PROFILE.latency} ms; median of ${ROUNDS} alternating rounds\n`,
    );
    console.log(
      'page'.padEnd(44),
      'usable ms'.padStart(10),
      'scripts in'.padStart(11),
      'script ms'.padStart(10),
      'first visit'.padStart(12),
      'repeat (before usable)'.padStart(24),
    );
    console.log(
      'sign-in (Fizzwright)'.padEnd(44),
      oursMs.toFixed(0).padStart(10),
      med(results.ours, 'scriptsDoneMs').toFixed(0).padStart(11),
      med(results.ours, 'scriptMs').toFixed(0).padStart(10),
      kb(med(results.ours, 'totalBytes')).padStart(12),
      kb(med(results.oursRepeat, 'bytesBeforeUsable')).padStart(24),
    );
    console.log(
      'empty Expo Router app'.padEnd(44),
      emptyMs.toFixed(0).padStart(10),
      med(results.empty, 'scriptsDoneMs').toFixed(0).padStart(11),
      med(results.empty, 'scriptMs').toFixed(0).padStart(10),
      kb(med(results.empty, 'totalBytes')).padStart(12),
    );
    console.log(
      'recipe designer, signed in (first visit)'.padEnd(44),
      median(results.designer).toFixed(0).padStart(10),
    );
    console.log('\nBytes of the sign-in screen’s first visit by resource type (median):');
    const types = [...new Set(results.ours.flatMap((v) => Object.keys(v.bytesByType)))];
    for (const type of types)
      console.log(`  ${type.padEnd(12)} ${kb(median(results.ours.map((v) => v.bytesByType[type] ?? 0))).padStart(10)}`);
    if (process.env.BENCH_WEB_TRACE) {
      for (const [label, list] of [
        ['sign-in', results.ours],
        ['empty app', results.empty],
      ] as const) {
        const last = list[list.length - 1];
        console.log(`\nLast ${label} first visit: usable at ${last.usableMs.toFixed(0)} ms`);
        for (const t of last.timeline)
          console.log(`  ${t.at.toFixed(0).padStart(6)} ms  ${kb(t.bytes).padStart(9)}  ${t.url}`);
      }
    }
    const ratio = oursMs / emptyMs;
    const firstBytes = med(results.ours, 'totalBytes');
    const repeatBytes = med(results.oursRepeat, 'bytesBeforeUsable');
    console.log('');
    console.log(
      `${ratio <= 1.2 ? 'meets' : 'MISSES'}  sign-in usable / empty app usable = ${ratio.toFixed(2)}  (goal ≤ 1.20)`,
    );
    console.log(`${firstBytes <= 360 * 1024 ? 'meets' : 'MISSES'}  first visit ${kb(firstBytes)}  (goal ≤ 360 KB)`);
    console.log(
      `${repeatBytes <= 20 * 1024 ? 'meets' : 'MISSES'}  repeat visit ${kb(repeatBytes)} before usable  (goal ≤ 20 KB)`,
    );
  } finally {
    await browser.close();
    empty.close();
    await ours.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
