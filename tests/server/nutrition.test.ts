import type { Express } from 'express';

import type { RecipeContent } from '@/lib/schemas/recipes';
import { NutritionLabValue } from '@/server/db';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';
import { recipe } from '@/tests/fixtures/nutrition';

import { addMember, type Agent, asBuffer, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let developer: Agent;
let brewer: Agent;
let stranger: Agent;
let recipeId: number;
let bottle355: number;
let bottle750: number;

const bottle = (name: string, liquidMl: number) => ({
  name,
  liquidMl,
  headspaceMl: 20,
  closure: 'crown-cap',
  material: 'glass',
  maxWorkingPressureBar: 6,
  pressureSource: 'Supplier sheet',
});

/** The hand-worked recipe of tests/fixtures/nutrition.ts, in a bottle format and with lines of this brewery. */
const content = (bottleFormatId: number, lines: RecipeContent['lines']) => recipe({ bottleFormatId, lines });

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  owner = (await signUpOwner(app)).agent;
  developer = (await addMember(app, owner, 'developer', 'Dev Eloper')).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
  stranger = (await signUpOwner(app)).agent;
  bottle355 = (await owner.post('/api/bottle-formats').send(bottle('Can-size 355', 355)).expect(201)).body.id;
  bottle750 = (await owner.post('/api/bottle-formats').send(bottle('Sharing 750', 750)).expect(201)).body.id;
  const strawberry = (await owner.get('/api/ingredients').query({ q: 'strawberries raw' }).expect(200)).body.items.find(
    (i: { name: string }) => i.name === 'Strawberries, raw',
  ).id;
  recipeId = (
    await developer
      .post('/api/recipes')
      .send({
        name: 'Field label',
        content: content(bottle355, [{ ingredientId: strawberry, amount: 60, unit: 'g-per-l', extractionPct: 50 }]),
      })
      .expect(201)
  ).body.id;
});
afterAll(stopApp);

describe('GET /api/recipes/:id/nutrition', () => {
  it('answers both bases for the bottle, worked by hand in tests/lib/nutrition.test.ts (SR25 NDB 09316, 19335)', async () => {
    const res = await brewer.get(`/api/recipes/${recipeId}/nutrition`).expect(200);
    expect(res.body).toMatchObject({
      servingMl: 355,
      servingsPerContainer: 1,
      serving: { household: '1 bottle', metric: '355 mL', layout: 'single-serving' },
      declared: 'afterConditioning',
      lab: null,
      allergens: [],
      allergenStatement: null,
    });
    expect(res.body.asFormulated.label).toMatchObject({ calories: '30', totalSugars: '5 g', addedSugars: '4 g' });
    expect(res.body.afterConditioning.label).toMatchObject({ calories: '25', totalSugars: '0 g' });
    expect(res.body.perContainer).toBeUndefined();
    expect(res.body.notes.join(' ')).toMatch(/Trans Fat: no value for Strawberries/);
  });

  it('gives two columns for a bottle of 200 % to 300 % of the reference amount (750 mL)', async () => {
    const version = (await developer.get(`/api/recipes/${recipeId}`).expect(200)).body;
    await developer
      .put(`/api/recipes/${recipeId}`)
      .send({
        name: version.name,
        flavourNotes: '',
        content: { ...version.content, bottleFormatId: bottle750 },
        baseVersion: version.version,
      })
      .expect(200);
    const res = await developer.get(`/api/recipes/${recipeId}/nutrition`).expect(200);
    expect(res.body.serving).toMatchObject({ layout: 'dual-column', servingMl: 360, household: '12 fl oz' });
    expect(res.body.servingsPerContainer).toBe(2);
    expect(res.body.perContainer.afterConditioning.label.calories).toBeDefined();
    // The first version keeps its own bottle.
    const first = await developer.get(`/api/recipes/${recipeId}/nutrition`).query({ version: 1 }).expect(200);
    expect(first.body.servingMl).toBe(355);
  });

  it('refuses another brewery’s recipe as if it did not exist, and bad queries by name', async () => {
    await stranger.get(`/api/recipes/${recipeId}/nutrition`).expect(404);
    const bad = await owner.get(`/api/recipes/${recipeId}/nutrition`).query({ servingMl: 'lots' }).expect(400);
    expect(bad.body.error.fields.servingMl).toBeDefined();
    await owner.get(`/api/recipes/${recipeId}/nutrition`).query({ version: 99 }).expect(404);
  });
});

describe('PUT /api/recipes/:id/nutrition/lab', () => {
  it('lets an owner enter lab values per 100 mL, which replace the estimate', async () => {
    const res = await owner
      .put(`/api/recipes/${recipeId}/nutrition/lab`)
      .send({ version: 2, per100Ml: { totalSugars: 0.4, totalCarbohydrate: 0.6, sodium: 3 }, reference: 'Report 17' })
      .expect(200);
    expect(res.body.declared).toBe('lab');
    // 0.4 g per 100 mL × 3.6 = 1.44 g per 360 mL → 1 g; sodium 3 mg × 3.6 = 10.8 mg → 10 mg (5 mg steps).
    expect(res.body.lab.label).toMatchObject({ totalSugars: '1 g', sodium: '10 mg' });
    expect(res.body.lab.fromLab).toEqual(['sodium', 'totalCarbohydrate', 'totalSugars']);
    expect(res.body.lab).toMatchObject({ reference: 'Report 17', enteredBy: expect.any(String) });
    // Version 1 has no lab values.
    expect((await owner.get(`/api/recipes/${recipeId}/nutrition`).query({ version: 1 })).body.lab).toBeNull();
  });

  it('is for owners only', async () => {
    const body = { version: 2, per100Ml: { sodium: 1 } };
    await developer.put(`/api/recipes/${recipeId}/nutrition/lab`).send(body).expect(403);
    await brewer.put(`/api/recipes/${recipeId}/nutrition/lab`).send(body).expect(403);
    await stranger.put(`/api/recipes/${recipeId}/nutrition/lab`).send(body).expect(404);
  });

  it('names each bad field and stores nothing', async () => {
    const res = await owner
      .put(`/api/recipes/${recipeId}/nutrition/lab`)
      .send({ version: 2, per100Ml: { sodium: -1, calories: '12', totalSugars: 5, totalCarbohydrate: 2 } })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'per100Ml.calories',
      'per100Ml.sodium',
      'per100Ml.totalSugars',
    ]);
    const sugars = await owner
      .put(`/api/recipes/${recipeId}/nutrition/lab`)
      .send({ version: 2, per100Ml: { totalSugars: 5, totalCarbohydrate: 2 } })
      .expect(400);
    expect(sugars.body.error.fields['per100Ml.totalSugars']).toMatch(/cannot be more than total carbohydrate/);
    const missing = await owner
      .put(`/api/recipes/${recipeId}/nutrition/lab`)
      .send({ version: 9, per100Ml: { sodium: 1 } })
      .expect(400);
    expect(missing.body.error.fields.version).toBeDefined();
    const now = await owner.get(`/api/recipes/${recipeId}/nutrition`).expect(200);
    expect(now.body.lab.reference).toBe('Report 17');
  });

  it('keeps every one of 20 entries sent at once, the last in force, and clears with empty values', async () => {
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        owner
          .put(`/api/recipes/${recipeId}/nutrition/lab`)
          .send({ version: 2, per100Ml: { sodium: i + 1 }, reference: `Batch ${i}` }),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(200));
    expect(await NutritionLabValue.count({ where: { recipeId, versionNumber: 2 } })).toBe(21);
    const cleared = await owner
      .put(`/api/recipes/${recipeId}/nutrition/lab`)
      .send({ version: 2, per100Ml: {} })
      .expect(200);
    expect(cleared.body.lab).toBeNull();
    expect(cleared.body.declared).toBe('afterConditioning');
  });
});

describe('GET /api/recipes/:id/nutrition.pdf, .png and .csv', () => {
  it('downloads the panel as a PDF, a PNG and CSV values', async () => {
    const pdf = await developer.get(`/api/recipes/${recipeId}/nutrition.pdf`).buffer(true).parse(asBuffer).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    expect(pdf.headers['content-disposition']).toMatch(
      /attachment; filename="nutrition-\d+-v2-afterConditioning\.pdf"/,
    );

    const png = await developer
      .get(`/api/recipes/${recipeId}/nutrition.png`)
      .query({ basis: 'asFormulated' })
      .buffer(true)
      .parse(asBuffer)
      .expect(200);
    const bytes = png.body as Buffer;
    // PNG signature, then the IHDR width: the two-column panel is 380 pt wide, drawn at 3 times.
    expect(bytes.subarray(1, 4).toString()).toBe('PNG');
    expect(bytes.readUInt32BE(16)).toBe(1140);

    const csv = await developer.get(`/api/recipes/${recipeId}/nutrition.csv`).expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines).toHaveLength(1 + 2 * 15);
    expect(lines[1]).toMatch(/^afterConditioning,Calories,kcal,/);
  });

  it('refuses a basis it does not know, and another brewery', async () => {
    await developer.get(`/api/recipes/${recipeId}/nutrition.png`).query({ basis: 'guess' }).expect(400);
    await stranger.get(`/api/recipes/${recipeId}/nutrition.pdf`).expect(404);
  });
});

describe('house ingredients carry the label nutrients', () => {
  it('stores them per 100 g from the label and the panel reads their added sugars', async () => {
    const jam = await developer
      .post('/api/ingredients')
      .send({
        name: 'Hedge jam',
        category: 'puree',
        servingSize: 20,
        servingUnit: 'g',
        energyKcal: 50,
        carbohydrateG: 13,
        sugarsG: 12,
        addedSugarsG: 8,
        sodiumMg: 5,
        fermentableSharePct: 100,
        steepSharePct: 80,
        allergens: ['milk'],
      })
      .expect(201);
    // 8 g per 20 g serving → 40 g per 100 g; 5 mg → 25 mg per 100 g.
    expect(jam.body.labelPer100g).toMatchObject({ addedSugarsG: 40, sodiumMg: 25, calciumMg: null });
    const id = (
      await developer
        .post('/api/recipes')
        .send({
          name: 'Jam test',
          content: {
            ...content(bottle355, [{ ingredientId: jam.body.id, amount: 10, unit: 'g-per-l', extractionPct: 100 }]),
            sugars: [],
            baseBrew: {
              name: 'Base',
              residualSugarGPerL: 0,
              ph: 3.2,
              abvPercent: 0,
              residualCo2Volumes: 0.9,
              lastOpenTempC: null,
            },
          },
        })
        .expect(201)
    ).body.id;
    const res = await developer.get(`/api/recipes/${id}/nutrition`).expect(200);
    // 10 g/L × 0.355 L = 3.55 g of jam: sugars 3.55 × 0.60 = 2.13 g → 2 g, added 3.55 × 0.40 = 1.42 g → 1 g.
    expect(res.body.asFormulated.label).toMatchObject({ totalSugars: '2 g', addedSugars: '1 g' });
    expect(res.body.allergenStatement).toBe('Contains: Milk');
  });
});
