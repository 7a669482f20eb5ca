import type { Express } from 'express';
import request from 'supertest';

import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { addMember, type Agent, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let developer: Agent;
let brewer: Agent;
let content: Record<string, unknown>;
let strawberryId: number;

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  owner = (await signUpOwner(app)).agent;
  developer = (await addMember(app, owner, 'developer')).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as {
    id: number;
    liquidMl: number;
    name: string;
  }[];
  strawberryId = (await owner.get('/api/ingredients').query({ q: 'strawberries raw' }).expect(200)).body.items.find(
    (i: { name: string }) => i.name === 'Strawberries, raw',
  ).id;
  content = {
    baseBrew: {
      name: 'Green tea base',
      residualSugarGPerL: 2,
      ph: 3.1,
      abvPercent: 0.1,
      residualCo2Volumes: 0.9,
      lastOpenTempC: null,
    },
    lines: [{ ingredientId: strawberryId, amount: 40, unit: 'g-per-l', extractionPct: 50 }],
    sugars: [{ type: 'sucrose', gPerL: 4 }],
    process: {
      method: 'steep-strain',
      steepHours: 48,
      steepTempC: 4,
      strainLossPct: 10,
      carbonateHours: 72,
      carbonateTempC: 22,
      coldStoreTempC: 4,
    },
    bottleFormatId: formats.find((f) => f.name === 'Glass crown cap 473 mL')!.id,
    targetVolumes: 2.5,
    sweetnessNote: 'off-dry',
    highestTempC: 30,
  };
});
afterAll(stopApp);

const create = (agent: Agent, name = 'Strawberry meadow') =>
  agent.post('/api/recipes').send({ name, flavourNotes: 'Ripe berries, a little green tea.', content });

describe('POST /api/recipes', () => {
  it('creates version 1 for developers and owners, not brewers', async () => {
    const res = await create(developer).expect(201);
    expect(res.body).toMatchObject({
      name: 'Strawberry meadow',
      status: 'draft',
      currentVersion: 1,
      content: { sugars: [{ type: 'sucrose', gPerL: 4 }] },
    });
    // The dataset's "Strawberries, raw" reads as its short display name.
    expect(res.body.ingredientNames[strawberryId]).toBe('Strawberries');
    await create(brewer).expect(403);
    await request(app).post('/api/recipes').send({}).expect(401);
  });

  it.each([
    [
      'a zero amount',
      { lines: [{ ingredientId: 0, amount: 0, unit: 'g-per-l', extractionPct: 50 }] },
      'content.lines[0].amount',
      /more than 0/,
    ],
    [
      'a unit that does not fit',
      { lines: [{ ingredientId: 1, amount: 5, unit: 'cups', extractionPct: 50 }] },
      'content.lines[0].unit',
      /Choose g per litre/,
    ],
    ['a negative sugar', { sugars: [{ type: 'sucrose', gPerL: -2 }] }, 'content.sugars[0].gPerL', /at least 0/],
  ])('refuses %s and stores nothing', async (_what, change, field, message) => {
    const before = (await owner.get('/api/recipes').expect(200)).body.length;
    const res = await owner
      .post('/api/recipes')
      .send({ name: 'Refused', content: { ...content, ...change } })
      .expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect((await owner.get('/api/recipes').expect(200)).body).toHaveLength(before);
  });

  it("refuses another brewery's house ingredient", async () => {
    const stranger = await signUpOwner(app);
    const theirs = await stranger.agent
      .post('/api/ingredients')
      .send({
        name: 'Their purée',
        category: 'puree',
        servingSize: 100,
        sugarsG: 10,
        fermentableSharePct: 100,
        steepSharePct: 80,
      })
      .expect(201);
    const res = await owner
      .post('/api/recipes')
      .send({
        name: 'Borrowed',
        content: {
          ...content,
          lines: [{ ingredientId: theirs.body.id, amount: 10, unit: 'g-per-l', extractionPct: 50 }],
        },
      })
      .expect(400);
    expect(res.body.error.fields['content.lines[0].ingredientId']).toMatch(/not in your library|No such ingredient/);
  });
});

describe('PUT /api/recipes/:id (a new version per save)', () => {
  it('keeps every version, shows what changed, restores as a new version', async () => {
    const created = (await create(developer, 'Rhubarb and rose')).body;
    const saved = await developer
      .put(`/api/recipes/${created.id}`)
      .send({
        name: 'Rhubarb and rose',
        flavourNotes: '',
        baseVersion: 1,
        note: 'More fruit',
        content: {
          ...content,
          lines: [{ ingredientId: strawberryId, amount: 55, unit: 'g-per-l', extractionPct: 50 }],
        },
      })
      .expect(200);
    expect(saved.body.currentVersion).toBe(2);
    const versions = await brewer.get(`/api/recipes/${created.id}/versions`).expect(200);
    expect(versions.body.map((v: { number: number }) => v.number)).toEqual([2, 1]);
    const diff = await brewer.get(`/api/recipes/${created.id}/diff`).query({ from: 1, to: 2 }).expect(200);
    expect(diff.body).toEqual([
      { area: 'ingredients', what: 'Strawberries', before: '40 g per litre', after: '55 g per litre' },
    ]);
    const restored = await developer.post(`/api/recipes/${created.id}/restore`).send({ version: 1 }).expect(200);
    expect(restored.body).toMatchObject({
      currentVersion: 3,
      versionNote: 'Restored version 1',
      content: { lines: [{ amount: 40 }] },
    });
    const old = await brewer.get(`/api/recipes/${created.id}`).query({ version: 2 }).expect(200);
    expect(old.body.content.lines[0].amount).toBe(55);
  });

  it('tells the second of two people saving the same version, and keeps the first save', async () => {
    const created = (await create(developer, 'Two cooks')).body;
    const body = { name: 'Two cooks', flavourNotes: '', baseVersion: 1, content };
    await developer
      .put(`/api/recipes/${created.id}`)
      .send({ ...body, note: 'First' })
      .expect(200);
    const second = await owner
      .put(`/api/recipes/${created.id}`)
      .send({ ...body, note: 'Second' })
      .expect(409);
    expect(second.body.error).toMatchObject({ code: 'stale_version', message: expect.stringMatching(/Reload/) });
    expect((await owner.get(`/api/recipes/${created.id}`).expect(200)).body).toMatchObject({
      currentVersion: 2,
      versionNote: 'First',
    });
  });

  it('duplicates, archives (never deletes) and refuses edits to archived recipes', async () => {
    const created = (await create(developer, 'Elderflower spritz')).body;
    const copy = await developer.post(`/api/recipes/${created.id}/duplicate`).send({}).expect(201);
    expect(copy.body).toMatchObject({ name: 'Elderflower spritz (variation)', currentVersion: 1 });
    await developer.post(`/api/recipes/${created.id}/archive`).send({}).expect(200);
    const edit = await developer
      .put(`/api/recipes/${created.id}`)
      .send({ name: 'x y', baseVersion: 1, content })
      .expect(409);
    expect(edit.body.error.code).toBe('archived');
    const archived = await developer.get('/api/recipes').query({ status: 'archived' }).expect(200);
    expect(archived.body.map((r: { id: number }) => r.id)).toContain(created.id);
    await brewer.post(`/api/recipes/${created.id}/archive`).send({}).expect(403);
  });
});

describe('POST /api/recipes/evaluate and /:id/scale', () => {
  it('answers the numbers for one bottle while editing', async () => {
    const res = await brewer.post('/api/recipes/evaluate').send({ content }).expect(200);
    // By hand, per 473 mL: strawberries 40 × 0.473 = 18.92 g × 4.89 % = 0.9252 g, all of it in the worst case although
    // 50 % is expected to leave the fruit when steeped; sucrose 4 × 0.473 = 1.892 g; base 2 × 0.473 = 0.946 g.
    // Fermentable 3.7632 g in the worst case (3.3006 g with the extraction share).
    expect(res.body.carbonation.sugar.fermentableG).toBeCloseTo(3.7632, 3);
    // The recipe's highest is 30 °C; the brewery's warm day (35 °C by default) is hotter, so it is checked too.
    expect(res.body.temperatureNames).toEqual(['Carbonating', 'Cold store', 'Highest', 'Warmest the bottles may meet']);
    expect(res.body.carbonation.pressures.map((p: { tempC: number }) => p.tempC)).toEqual([22, 4, 30, 35]);
    expect(res.body.carbonation.warmDayTempC).toBe(35);
  });

  it('scales to 200 bottles, with the top-up after straining', async () => {
    const created = (await create(developer, 'Scaled berry')).body;
    const res = await brewer
      .post(`/api/recipes/${created.id}/scale`)
      .send({ batch: { kind: 'bottles', value: 200 } })
      .expect(200);
    // 200 × 473 mL = 94.6 L; strawberries 40 g/L → 3784 g → 3.78 kg; 10 % strain loss → top up 9.46 L, base 104.06 L.
    expect(res.body).toMatchObject({
      bottles: 200,
      finishedLitres: { value: 94.6 },
      topUpLitres: { value: 9.46 },
      baseLitres: { value: 104.1 },
    });
    expect(res.body.lines[0]).toMatchObject({ name: 'Strawberries', value: 3.78, unit: 'kg' });
    const bad = await brewer
      .post(`/api/recipes/${created.id}/scale`)
      .send({ batch: { kind: 'litres', value: 1e9 } })
      .expect(400);
    expect(bad.body.error.fields['batch.value']).toBeDefined();
    await brewer
      .post(`/api/recipes/${created.id}/scale`)
      .send({ batch: { kind: 'litres', value: 0 } })
      .expect(400);
  });
});

describe('tastings', () => {
  it('records scores, and a sugar addition raises the sugar in a new version', async () => {
    const created = (await create(developer, 'Tasted ginger')).body;
    const res = await developer
      .post(`/api/recipes/${created.id}/tastings`)
      .send({
        tastedOn: '2026-11-30',
        notes: 'Needs more lift',
        sweetness: 2,
        sourness: 4,
        fizz: 3,
        flavour: 4,
        sugarAddition: { type: 'sucrose', grams: 4, toMl: 473 },
      })
      .expect(201);
    // Listed against the version tasted (1), with the version its sugar made (2).
    expect(res.body[0]).toMatchObject({
      versionNumber: 1,
      createdVersion: 2,
      scores: { sweetness: 2, sourness: 4, fizz: 3, flavour: 4 },
    });
    const recipe = await developer.get(`/api/recipes/${created.id}`).expect(200);
    // 4 g into 473 mL = 8.4567 g/L more: 4 + 8.4567 = 12.4567 g/L.
    expect(recipe.body.content.sugars[0].gPerL).toBeCloseTo(12.4567, 3);
    expect(recipe.body.versionNote).toMatch(/\+4 g sucrose to 473 mL/);
    await developer
      .post(`/api/recipes/${created.id}/tastings`)
      .send({ tastedOn: 'yesterday', sweetness: 9, sourness: 1, fizz: 1, flavour: 1 })
      .expect(400);
    await brewer
      .post(`/api/recipes/${created.id}/tastings`)
      .send({ tastedOn: '2026-11-30', sweetness: 3, sourness: 3, fizz: 3, flavour: 3 })
      .expect(403);
  });
});

describe('who may call the recipe routes', () => {
  it('gives brewers 403 on every route that changes a recipe, and signed-out callers 401 everywhere', async () => {
    const { id } = (await create(developer, 'Role table')).body;
    const changing: [string, string, object][] = [
      ['post', '/api/recipes', { name: 'x', content }],
      ['put', `/api/recipes/${id}`, { name: 'x y', baseVersion: 1, content }],
      ['post', `/api/recipes/${id}/restore`, { version: 1 }],
      ['post', `/api/recipes/${id}/duplicate`, {}],
      ['post', `/api/recipes/${id}/archive`, {}],
      ['post', `/api/recipes/${id}/restore-archived`, {}],
      [
        'post',
        `/api/recipes/${id}/tastings`,
        { tastedOn: '2026-12-01', sweetness: 3, sourness: 3, fizz: 3, flavour: 3 },
      ],
      ['post', `/api/recipes/${id}/submit`, { version: 1 }],
    ];
    for (const [method, path, body] of changing) {
      const res = await (brewer as unknown as Record<string, (p: string) => request.Test>)[method](path).send(body);
      expect([method, path, res.status]).toEqual([method, path, 403]);
    }
    const reading = [
      `/api/recipes`,
      `/api/recipes/${id}`,
      `/api/recipes/${id}/versions`,
      `/api/recipes/${id}/tastings`,
      `/api/recipes/${id}/review`,
    ];
    for (const path of reading) {
      expect([path, (await brewer.get(path)).status]).toEqual([path, 200]);
      expect([path, (await request(app).get(path)).status]).toEqual([path, 401]);
    }
    const stranger = await signUpOwner(app);
    await stranger.agent.get(`/api/recipes/${id}`).expect(404);
    await stranger.agent
      .post(`/api/recipes/${id}/scale`)
      .send({ batch: { kind: 'litres', value: 10 } })
      .expect(404);
  });
});
