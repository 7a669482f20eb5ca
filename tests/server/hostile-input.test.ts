import type { Express, Router } from 'express';
import request from 'supertest';

import { apiRouter } from '@/server/app';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { type Agent, signUpOwner, startApp, stopApp } from './helpers';

interface Layer {
  rawPath?: string;
  route?: { path: string; methods: Record<string, boolean> };
  handle: Router & { stack?: Layer[] };
}

/** Every route of the API with its full path, found by walking the router as the access test does. */
function routesOf(router: Router, prefix = '/api'): { method: string; path: string }[] {
  const found: { method: string; path: string }[] = [];
  for (const layer of (router as unknown as { stack: Layer[] }).stack) {
    if (layer.route) {
      for (const method of Object.keys(layer.route.methods))
        found.push({ method, path: `${prefix}${layer.route.path}` });
    } else if (layer.handle.stack) {
      found.push(...routesOf(layer.handle, `${prefix}${layer.rawPath ?? ''}`));
    }
  }
  return found;
}

// Field names the API's bodies and queries use; a hostile value goes into all of them at once.
const FIELDS = [
  'email',
  'password',
  'currentPassword',
  'newPassword',
  'name',
  'breweryName',
  'token',
  'role',
  'q',
  'category',
  'content',
  'lines',
  'version',
  'baseVersion',
  'comment',
  'message',
  'reason',
  'note',
  'overrideReason',
  'liquidMl',
  'headspaceMl',
  'temperaturesC',
  'kind',
  'value',
  'units',
  'unitSystem',
  'abvLimitPercent',
  'maxWorkingPressureBar',
  'servingSize',
  'sugarsG',
];
const every = (value: unknown) => Object.fromEntries(FIELDS.map((f) => [f, value]));

const HOSTILE_BODIES: [string, string][] = [
  ['an empty object', '{}'],
  ['an array', '[]'],
  ['a JSON string', '"text"'],
  ['null', 'null'],
  ['arrays in every field', JSON.stringify(every([]))],
  ['objects in every field', JSON.stringify(every({ a: 1 }))],
  ['lists of objects in every field', JSON.stringify(every([{ a: [] }]))],
  ['booleans in every field', JSON.stringify(every(true))],
  ['a NUL in every field', JSON.stringify(every('a\u0000b'))],
  ['huge numbers in every field', JSON.stringify(every(1e308))],
  ['__proto__', '{"__proto__": {"role": "owner"}, "email": "x@y.test"}'],
  ['constructor', '{"constructor": {"prototype": {"x": 1}}, "name": "x"}'],
  ['toString', '{"toString": 1, "valueOf": [], "hasOwnProperty": "x"}'],
  ['nested reserved keys', '{"content": {"__proto__": {}, "lines": [{"constructor": 1}]}}'],
  ['deep nesting', `${'{"content":'.repeat(200)}1${'}'.repeat(200)}`],
];

const HOSTILE_QUERIES = [
  'q=a&q=b',
  'q=%00',
  'version=a&version=b',
  'page=-1&pageSize=1e309',
  'version=%00',
  'status[]=x',
  'from=1&to=1&from=2',
  'kind=bottles&value=NaN',
];

let app: Express;
let owner: Agent;
let ownIds: Record<string, number>;
let strangerRecipeId: number;

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  owner = (await signUpOwner(app)).agent;
  const stranger = (await signUpOwner(app)).agent;
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number }[];
  const content = {
    baseBrew: {
      name: 'Base',
      residualSugarGPerL: 2,
      ph: 3.1,
      abvPercent: 0.1,
      residualCo2Volumes: 0.9,
      lastOpenTempC: null,
    },
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 4 }],
    process: { method: 'in-bottle', coldStoreTempC: 4, carbonateHours: 72, carbonateTempC: 22 },
    bottleFormatId: formats[0].id,
    targetVolumes: 2.5,
    sweetnessNote: '',
    highestTempC: 30,
  };
  const recipe = await owner.post('/api/recipes').send({ name: 'Target', content });
  const foreign = await stranger.post('/api/recipes').send({
    name: 'Foreign',
    content: {
      ...content,
      bottleFormatId: ((await stranger.get('/api/bottle-formats')).body as { id: number }[])[0].id,
    },
  });
  const ingredient = await owner.post('/api/ingredients').send({
    name: 'House syrup',
    category: 'puree',
    servingSize: 100,
    sugarsG: 60,
    fermentableSharePct: 100,
    steepSharePct: 100,
  });
  expect([recipe.status, foreign.status, ingredient.status]).toEqual([201, 201, 201]);
  ownIds = { recipe: recipe.body.id, ingredient: ingredient.body.id, format: formats[0].id };
  strangerRecipeId = foreign.body.id;
});
afterAll(stopApp);

/** The paths to try for a route: its ids as this brewery's, another brewery's, and junk. */
function pathsFor(template: string): string[] {
  const fill = (id: string) =>
    template
      .replace(/:id\b/g, id)
      .replace(/:token\b/g, 'x'.repeat(30))
      .replace(/:n\b/g, '1')
      .replace(/:code\b/g, '1-1-b1');
  const ownId = template.includes('/recipes')
    ? ownIds.recipe
    : template.includes('/ingredients')
      ? ownIds.ingredient
      : ownIds.format;
  // 3000000000: past a 32-bit integer, which PostgreSQL's id columns are.
  return [
    ...new Set([
      fill(String(ownId)),
      fill(String(strangerRecipeId)),
      fill('abc'),
      fill('1e309'),
      fill('3000000000'),
      fill('%00'),
    ]),
  ];
}

// Routes that would end the session the walk runs under.
const SKIPPED = new Set(['post /api/auth/sign-out']);

describe('every API route under hostile input', () => {
  it('answers 4xx, never 5xx, to every hostile body, query and path', async () => {
    const routes = routesOf(apiRouter()).filter((r) => !SKIPPED.has(`${r.method} ${r.path}`));
    expect(routes.length).toBeGreaterThan(40);
    const failures: string[] = [];
    let sent = 0;
    for (const route of routes) {
      for (const path of pathsFor(route.path)) {
        const call = (suffix = '') =>
          (owner as unknown as Record<string, (p: string) => request.Test>)[route.method](`${path}${suffix}`);
        const attempts: [string, () => request.Test][] =
          route.method === 'get'
            ? HOSTILE_QUERIES.map((q) => [`?${q}`, () => call(`?${q}`)])
            : HOSTILE_BODIES.map(([what, raw]) => [
                what,
                () => call().set('Content-Type', 'application/json').send(raw),
              ]);
        attempts.push(['a text/plain body', () => call().set('Content-Type', 'text/plain').send('x')]);
        for (const [what, attempt] of attempts) {
          const res = await attempt();
          sent += 1;
          if (res.status >= 500)
            failures.push(
              `${route.method.toUpperCase()} ${path} with ${what}: ${res.status} ${JSON.stringify(res.body)}`,
            );
          else if (res.status >= 400 && !res.body?.error?.code)
            failures.push(`${route.method.toUpperCase()} ${path} with ${what}: ${res.status} without the error shape`);
        }
      }
    }
    expect(sent).toBeGreaterThan(2000);
    expect(failures).toEqual([]);
  }, 180_000);

  it('names the field for a list where text belongs, a NUL, a reserved key and a repeated query parameter', async () => {
    const list = await request(app).post('/api/auth/sign-in').send({ email: [], password: 'x' }).expect(400);
    expect(list.body.error.fields.email).toMatch(/Give text here/);
    const nul = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: 'a\u0000@b.test', password: 'x' })
      .expect(400);
    expect(nul.body.error.fields.email).toMatch(/NUL/);
    const proto = await request(app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"__proto__": {"a": 1}, "email": "a@b.test", "password": "x"}')
      .expect(400);
    expect(Object.entries(proto.body.error.fields)).toContainEqual([
      '__proto__',
      expect.stringMatching(/not accepted/),
    ]);
    const repeated = await owner.get('/api/ingredients?q=a&q=b').expect(400);
    expect(repeated.body.error.fields.q).toMatch(/once/);
  });
});

describe('POST /api/ingredients/:id/attachments with a broken body', () => {
  const attach = () => owner.post(`/api/ingredients/${ownIds.ingredient}/attachments`);

  it('refuses a truncated body, a body with no boundary and a flood of fields with 4xx naming the file', async () => {
    const truncated = await attach()
      .set('Content-Type', 'multipart/form-data; boundary=XYZ')
      .send('--XYZ\r\nContent-Disposition: form-data; name="file"; filename="a.pdf"\r\n\r\n%PDF-1.4 cut');
    expect(truncated.status).toBe(400);
    expect(truncated.body.error.fields.file).toBeDefined();
    const noBoundary = await attach().set('Content-Type', 'multipart/form-data').send('whatever');
    expect(noBoundary.status).toBe(400);
    let flood = attach();
    for (let i = 0; i < 400; i++) flood = flood.field(`f${i}`, 'x'.repeat(1000));
    const flooded = await flood;
    expect(flooded.status).toBe(413);
    const big = await attach().field('note', 'x'.repeat(100_000)).attach('file', Buffer.from('%PDF-1.4\n'), 'a.pdf');
    expect(big.status).toBe(413);
  });
});
