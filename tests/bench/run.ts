/**
 * `npm run bench`: throughput and latency of the API under concurrent load on loopback, each endpoint measured in
 * the same run against references behind the same middleware. The server runs in its own process (as in
 * production, NODE_ENV=production, logs at warn) on a temporary database; autocannon drives it from this process.
 */
import os from 'node:os';

import autocannon from 'autocannon';

import { median, postgresFromArgs, signIn, startServer } from './server';

const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 32);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 6);
/** The calculation and its reference are measured in alternating rounds and the medians kept, so drift and order do not decide. */
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);

interface Measure {
  name: string;
  requestsPerSec: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
}

async function once(name: string, options: autocannon.Options): Promise<Measure> {
  const result = await autocannon({ ...options, connections: CONNECTIONS, duration: SECONDS });
  return {
    name,
    requestsPerSec: result.requests.average,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors,
    non2xx: result.non2xx,
  };
}

/** Several endpoints measured round-robin, ROUNDS times each after a warm-up; the median of each figure is kept. */
async function measure(targets: [string, autocannon.Options][]): Promise<Measure[]> {
  for (const [, options] of targets) await autocannon({ ...options, connections: CONNECTIONS, duration: 2 });
  const runs: Measure[][] = targets.map(() => []);
  for (let round = 0; round < ROUNDS; round++) {
    for (const [i, [name, options]] of targets.entries()) runs[i].push(await once(name, options));
  }
  return runs.map((list) => ({
    name: list[0].name,
    requestsPerSec: median(list.map((m) => m.requestsPerSec)),
    p50Ms: median(list.map((m) => m.p50Ms)),
    p99Ms: median(list.map((m) => m.p99Ms)),
    errors: list.reduce((sum, m) => sum + m.errors, 0),
    non2xx: list.reduce((sum, m) => sum + m.non2xx, 0),
  }));
}

/** What the Quick check sends: a bottle format of the brewery, one sugar, three temperatures. */
const carbonationBody = (bottleFormatId: number) =>
  JSON.stringify({
    liquidMl: 500,
    bottleFormatId,
    sugars: [{ type: 'sucrose', grams: 3 }],
    lastOpenTempC: 22,
    sealedTempC: 20,
    temperaturesC: [22, 4, 35],
    baseAbvPercent: 0.2,
    yield: 'worst',
  });

/**
 * Ingredient search latency over the full imported table: 200 queries, one at a time, made of word beginnings
 * drawn from the starter library's names (real ingredient words, 3 to 6 letters typed, sometimes two words).
 */
async function searchLatency(url: string, cookie: string): Promise<void> {
  const { loadStarterIngredients } = await import('@/server/seed/starter-ingredients');
  const words = [...new Set(loadStarterIngredients().flatMap((i) => i.name.toLowerCase().match(/[a-z]{4,}/g) ?? []))];
  let seed = 42;
  const random = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
  const pick = () => {
    const word = words[Math.floor(random() * words.length)];
    return word.slice(0, 3 + Math.floor(random() * 4));
  };
  const queries = Array.from({ length: 200 }, () => (random() < 0.3 ? `${pick()} ${pick()}` : pick()));
  const total = (await (await fetch(`${url}/api/ingredients?pageSize=1`, { headers: { cookie } })).json()) as {
    total: number;
  };
  for (const q of queries.slice(0, 20))
    await fetch(`${url}/api/ingredients?q=${encodeURIComponent(q)}`, { headers: { cookie } });
  const times: number[] = [];
  for (const q of queries) {
    const started = performance.now();
    const res = await fetch(`${url}/api/ingredients?q=${encodeURIComponent(q)}`, { headers: { cookie } });
    await res.json();
    times.push(performance.now() - started);
    if (!res.ok) throw new Error(`search for ${q} answered ${res.status}`);
  }
  times.sort((a, b) => a - b);
  const p = (share: number) => times[Math.min(times.length - 1, Math.floor(share * times.length))];
  console.log(
    `\nIngredient search over ${total.total} ingredients, ${queries.length} queries one at a time (e.g. "${queries.slice(0, 4).join('", "')}")`,
  );
  console.log(
    `p50 ${p(0.5).toFixed(1)} ms · p95 ${p(0.95).toFixed(1)} ms · max ${times[times.length - 1].toFixed(1)} ms`,
  );
  console.log(`${p(0.95) < 20 ? 'meets' : 'MISSES'}  search p95 = ${p(0.95).toFixed(1)} ms  (goal < 20 ms)`);
}

const BATCH_COUNT = Number(process.env.BENCH_BATCHES ?? 1000);

/** Latencies of `count` GETs one at a time, after 10 to warm up: p50 and p95, ms. */
async function getLatency(
  url: string,
  cookie: string,
  paths: () => string,
  count = 200,
): Promise<{ p50: number; p95: number }> {
  for (let i = 0; i < 10; i++) await (await fetch(`${url}${paths()}`, { headers: { cookie } })).arrayBuffer();
  const times: number[] = [];
  for (let i = 0; i < count; i++) {
    const started = performance.now();
    const res = await fetch(`${url}${paths()}`, { headers: { cookie } });
    await res.arrayBuffer();
    if (!res.ok) throw new Error(`${paths()} answered ${res.status}`);
    times.push(performance.now() - started);
  }
  return { p50: percentile(times, 0.5), p95: percentile(times, 0.95) };
}

/** Batch detail with 200 readings, and the batch list over BENCH_BATCHES batches: each p95 under 50 ms. */
async function batchFigures(url: string, cookie: string): Promise<void> {
  const json = { 'content-type': 'application/json', cookie };
  const approved = (await (await fetch(`${url}/api/recipes?status=approved`, { headers: { cookie } })).json()) as {
    id: number;
    approvedVersion: number;
  }[];
  const recipe = approved[0];
  const post = (path: string, body: unknown) =>
    fetch(`${url}${path}`, { method: 'POST', headers: json, body: JSON.stringify(body) });
  const started = performance.now();
  let made = 0;
  const ids: number[] = [];
  while (made < BATCH_COUNT) {
    const wave = Math.min(10, BATCH_COUNT - made);
    const answers = await Promise.all(
      Array.from({ length: wave }, () =>
        post('/api/batches', {
          recipeId: recipe.id,
          version: recipe.approvedVersion,
          batch: { kind: 'bottles', value: 24 },
        }),
      ),
    );
    for (const a of answers) {
      if (a.status !== 201) throw new Error(`starting a batch answered ${a.status}`);
      ids.push(((await a.json()) as { id: number }).id);
    }
    made += wave;
  }
  const heavy = ids[0];
  const kinds = [
    { kind: 'ph', value: 3.2, stage: 'base' },
    { kind: 'gauge-pressure', value: 1.4, tempC: 20, stage: 'conditioning' },
    { kind: 'temperature', value: 21, stage: 'conditioning' },
    { kind: 'abv', value: 0.2, stage: 'finished' },
  ];
  for (let i = 0; i < 200; i++) {
    const res = await post(`/api/batches/${heavy}/readings`, kinds[i % kinds.length]);
    if (res.status !== 201) throw new Error(`a reading answered ${res.status}`);
  }
  const setupS = (performance.now() - started) / 1000;
  const detail = await getLatency(url, cookie, () => `/api/batches/${heavy}`);
  let page = 0;
  const states = ['all', 'in-progress', 'all', 'released'];
  const list = await getLatency(
    url,
    cookie,
    () => `/api/batches?state=${states[page % 4]}&page=${(page++ % 40) + 1}&pageSize=25`,
  );
  console.log(`\nBatches: ${BATCH_COUNT} started and 200 readings on one in ${setupS.toFixed(1)} s`);
  console.log(
    `${detail.p95 < 50 ? 'meets' : 'MISSES'}  batch detail with 200 readings: p50 ${detail.p50.toFixed(1)} ms · p95 ${detail.p95.toFixed(1)} ms  (goal p95 < 50 ms)`,
  );
  console.log(
    `${list.p95 < 50 ? 'meets' : 'MISSES'}  batch list over ${BATCH_COUNT} batches (25 a page): p50 ${list.p50.toFixed(1)} ms · p95 ${list.p95.toFixed(1)} ms  (goal p95 < 50 ms)`,
  );
}

const WRITER_SECONDS = Number(process.env.BENCH_WRITER_SECONDS ?? 30);

interface WriterRun {
  saves: number;
  statuses: Map<number, number>;
  latenciesMs: number[];
}

/** Writers each saving their own recipe again and again for a while: each save is a new version. */
async function writers(
  url: string,
  json: Record<string, string>,
  recipes: { id: number; body: Record<string, unknown> }[],
  seconds: number,
): Promise<WriterRun> {
  const run: WriterRun = { saves: 0, statuses: new Map(), latenciesMs: [] };
  const until = Date.now() + seconds * 1000;
  await Promise.all(
    recipes.map(async (recipe) => {
      let baseVersion = recipe.body.baseVersion as number;
      while (Date.now() < until) {
        const started = performance.now();
        const res = await fetch(`${url}/api/recipes/${recipe.id}`, {
          method: 'PUT',
          headers: json,
          body: JSON.stringify({ ...recipe.body, baseVersion }),
        });
        const answer = (await res.json()) as { currentVersion?: number };
        run.latenciesMs.push(performance.now() - started);
        run.statuses.set(res.status, (run.statuses.get(res.status) ?? 0) + 1);
        if (res.ok) {
          run.saves += 1;
          baseVersion = answer.currentVersion!;
        }
      }
      recipe.body.baseVersion = baseVersion;
    }),
  );
  return run;
}

const percentile = (values: number[], share: number) =>
  [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.floor(share * values.length))] ?? 0;
const fiveXx = (statuses: Map<number, number>) =>
  [...statuses].filter(([code]) => code >= 500).reduce((sum, [, n]) => sum + n, 0);
const statusList = (statuses: Map<number, number>) =>
  [...statuses]
    .sort(([a], [b]) => a - b)
    .map(([code, n]) => `${n}×${code}`)
    .join(', ');

/**
 * Many writers at once: 1 and then 20 people each saving their own recipe for a while; 20 saves of one version at
 * once (exactly one may win); 50 sign-ups at once. No 5xx anywhere, and 20 writers at least as fast as one.
 */
async function writerFigures(url: string, cookie: string): Promise<void> {
  const json = { 'content-type': 'application/json', cookie };
  const list = (await (await fetch(`${url}/api/recipes`, { headers: { cookie } })).json()) as { id: number }[];
  const template = (await (await fetch(`${url}/api/recipes/${list[0].id}`, { headers: { cookie } })).json()) as {
    content: Record<string, unknown>;
  };
  const recipes = await Promise.all(
    Array.from({ length: 20 }, async (_, i) => {
      const body = { name: `Bench writer ${i + 1}`, flavourNotes: '', note: 'bench save', content: template.content };
      const res = await fetch(`${url}/api/recipes`, { method: 'POST', headers: json, body: JSON.stringify(body) });
      if (res.status !== 201) throw new Error(`creating a bench recipe answered ${res.status}`);
      const created = (await res.json()) as { id: number; currentVersion: number };
      return { id: created.id, body: { ...body, baseVersion: created.currentVersion } };
    }),
  );
  const one = await writers(url, json, recipes.slice(0, 1), Math.max(5, WRITER_SECONDS / 3));
  const oneRate = one.saves / Math.max(5, WRITER_SECONDS / 3);
  const crowd = await writers(url, json, recipes, WRITER_SECONDS);
  const crowdRate = crowd.saves / WRITER_SECONDS;

  const target = recipes[0];
  const current = (
    (await (await fetch(`${url}/api/recipes/${target.id}`, { headers: { cookie } })).json()) as {
      currentVersion: number;
    }
  ).currentVersion;
  const race = await Promise.all(
    Array.from({ length: 20 }, () =>
      fetch(`${url}/api/recipes/${target.id}`, {
        method: 'PUT',
        headers: json,
        body: JSON.stringify({ ...target.body, baseVersion: current }),
      }).then((r) => r.status),
    ),
  );
  const raceStatuses = new Map<number, number>();
  for (const status of race) raceStatuses.set(status, (raceStatuses.get(status) ?? 0) + 1);

  const stamp = Date.now();
  const signUps = await Promise.all(
    Array.from({ length: 50 }, (_, i) =>
      fetch(`${url}/api/auth/sign-up`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({
          breweryName: `Bench brewery ${i}`,
          name: 'Bench Person',
          email: `bench-${stamp}-${i}@bench.example`,
          password: 'bench-password-1',
        }),
      }).then((r) => r.status),
    ),
  );
  const signUpStatuses = new Map<number, number>();
  for (const status of signUps) signUpStatuses.set(status, (signUpStatuses.get(status) ?? 0) + 1);

  console.log(`
Writers: each saves its own recipe (a new version per save), ${WRITER_SECONDS} s for 20 writers`);
  console.log(
    `1 writer:   ${oneRate.toFixed(1)} saves/s · p50 ${percentile(one.latenciesMs, 0.5).toFixed(0)} ms · p99 ${percentile(one.latenciesMs, 0.99).toFixed(0)} ms · ${statusList(one.statuses)}`,
  );
  console.log(
    `20 writers: ${crowdRate.toFixed(1)} saves/s · p50 ${percentile(crowd.latenciesMs, 0.5).toFixed(0)} ms · p99 ${percentile(crowd.latenciesMs, 0.99).toFixed(0)} ms · ${statusList(crowd.statuses)}`,
  );
  console.log(`20 saves of one version at once: ${statusList(raceStatuses)}`);
  console.log(`50 sign-ups at once: ${statusList(signUpStatuses)}`);
  const checks = [
    [
      `20 writers: ${fiveXx(crowd.statuses)} × 5xx`,
      fiveXx(crowd.statuses) === 0 && fiveXx(one.statuses) === 0,
      'goal 0',
    ],
    [`20 writers / 1 writer throughput = ${(crowdRate / oneRate).toFixed(2)}`, crowdRate >= oneRate, 'goal ≥ 1.00'],
    [
      `20 saves of one version: ${raceStatuses.get(200) ?? 0} × 200, ${raceStatuses.get(409) ?? 0} × 409`,
      raceStatuses.get(200) === 1 && raceStatuses.get(409) === 19,
      'goal 1 and 19, 0 × 5xx',
    ],
    [`50 sign-ups at once: ${fiveXx(signUpStatuses)} × 5xx`, fiveXx(signUpStatuses) === 0, 'goal 0 (429 is fine)'],
  ] as const;
  for (const [text, ok, goal] of checks) console.log(`${ok ? 'meets' : 'MISSES'}  ${text}  (${goal})`);
}

async function main(): Promise<void> {
  const postgres = postgresFromArgs();
  const { url, stop } = await startServer({ BENCH_ROUTES: 'true' }, postgres);
  console.log(
    `Database: ${postgres ? 'PostgreSQL (a fresh database, dropped afterwards)' : 'SQLite (a temporary file)'}`,
  );
  try {
    const cookie = await signIn(url);
    const json = { 'content-type': 'application/json', cookie };
    const formats = (await (await fetch(`${url}/api/bottle-formats`, { headers: { cookie } })).json()) as {
      id: number;
      liquidMl: number;
    }[];
    const formatId = formats.find((f) => f.liquidMl === 500)!.id;
    const [health, open, signedIn] = await measure([
      ['GET /api/health', { url: `${url}/api/health` }],
      ['GET /api/bench/open (nothing, public)', { url: `${url}/api/bench/open` }],
      ['GET /api/bench/signed-in (nothing, session check)', { url: `${url}/api/bench/signed-in`, headers: { cookie } }],
    ]);
    const [calc, noop] = await measure([
      [
        'POST /api/calculations/carbonation',
        { url: `${url}/api/calculations/carbonation`, method: 'POST', headers: json, body: carbonationBody(formatId) },
      ],
      [
        'POST /api/bench/noop (same middleware, no calculation)',
        { url: `${url}/api/bench/noop`, method: 'POST', headers: json, body: carbonationBody(formatId) },
      ],
    ]);
    const results = [health, open, signedIn, calc, noop];
    console.log(
      `\n${CONNECTIONS} connections, median of ${ROUNDS} rounds of ${SECONDS} s, Node ${process.version}, ${os.cpus().length} cores\n`,
    );
    console.log(
      'endpoint'.padEnd(56),
      'req/s'.padStart(9),
      'p50 ms'.padStart(8),
      'p99 ms'.padStart(8),
      'errors'.padStart(7),
    );
    for (const r of results) {
      console.log(
        r.name.padEnd(56),
        r.requestsPerSec.toFixed(0).padStart(9),
        r.p50Ms.toFixed(1).padStart(8),
        r.p99Ms.toFixed(1).padStart(8),
        String(r.errors + r.non2xx).padStart(7),
      );
    }
    const ratio = (a: number, b: number) => (a / b).toFixed(2);
    const checks = [
      [
        `calculation throughput / do-nothing throughput = ${ratio(calc.requestsPerSec, noop.requestsPerSec)}`,
        calc.requestsPerSec >= 0.9 * noop.requestsPerSec,
        'goal ≥ 0.90',
      ],
      [
        `calculation p99 / do-nothing p99 = ${ratio(calc.p99Ms, noop.p99Ms)}`,
        calc.p99Ms <= 1.2 * noop.p99Ms,
        'goal ≤ 1.20',
      ],
      [
        `session check: signed-in / public do-nothing throughput = ${ratio(signedIn.requestsPerSec, open.requestsPerSec)}`,
        signedIn.requestsPerSec >= 0.85 * open.requestsPerSec,
        'goal ≥ 0.85',
      ],
      [
        `session check: signed-in do-nothing / health throughput = ${ratio(signedIn.requestsPerSec, health.requestsPerSec)}`,
        signedIn.requestsPerSec >= 0.85 * health.requestsPerSec,
        'goal ≥ 0.85',
      ],
    ] as const;
    console.log('');
    for (const [text, ok, goal] of checks) console.log(`${ok ? 'meets' : 'MISSES'}  ${text}  (${goal})`);
    await searchLatency(url, cookie);
    await batchFigures(url, cookie);
    await writerFigures(url, cookie);
    if (results.some((r) => r.errors + r.non2xx > 0))
      console.log('\nSome requests failed: the figures above are not valid.');
  } finally {
    await stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
