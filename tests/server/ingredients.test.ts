import type { Express } from 'express';

import { IngredientChange, IngredientDisplayName } from '@/server/db';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { addMember, type Agent, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let developer: Agent;
let brewer: Agent;
beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  owner = (await signUpOwner(app)).agent;
  developer = (await addMember(app, owner, 'developer')).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
});
afterAll(stopApp);

// A purée from a supplier's label: 50 g serving with 6.5 g sugars, 0.2 g fat.
const label = {
  name: 'Hedge Lane blackcurrant purée',
  category: 'puree',
  servingSize: 50,
  servingUnit: 'g',
  energyKcal: 30,
  carbohydrateG: 7,
  sugarsG: 6.5,
  fibreG: 1.2,
  fatG: 0.2,
  proteinG: 0.4,
  fermentableSharePct: 100,
  steepSharePct: 80,
  allergens: [],
  costPerKg: 9.5,
  notes: null,
};

describe('GET /api/ingredients', () => {
  it('finds word prefixes: "straw rasp" finds strawberries and raspberries', async () => {
    const res = await brewer.get('/api/ingredients').query({ q: 'straw rasp' }).expect(200);
    const names = res.body.items.map((i: { name: string }) => i.name);
    expect(names).toEqual(expect.arrayContaining(['Strawberries, raw', 'Raspberries, raw']));
    expect(res.body.total).toBe(names.length);
  });

  it('returns values per 100 g and per gram, and the source record', async () => {
    const res = await brewer.get('/api/ingredients').query({ q: 'strawberries' }).expect(200);
    const strawberry = res.body.items.find((i: { name: string }) => i.name === 'Strawberries, raw');
    // USDA SR25, NDB 09316 (strawberries, raw): 4.89 g total sugars per 100 g.
    expect(strawberry).toMatchObject({
      scope: 'dataset',
      category: 'fruit',
      source: 'USDA SR25 record 09316',
      per100g: { sugarsG: 4.89 },
      perGram: { sugarsG: 0.0489 },
    });
  });

  it('filters by category, paginates, and lists house ingredients first', async () => {
    const house = await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Cherry house syrup', category: 'sugar-syrup' })
      .expect(201);
    const spices = await brewer.get('/api/ingredients').query({ category: 'spice', pageSize: 3 }).expect(200);
    expect(spices.body.items).toHaveLength(3);
    expect(spices.body.items.every((i: { category: string }) => i.category === 'spice')).toBe(true);
    const page2 = await brewer.get('/api/ingredients').query({ category: 'spice', pageSize: 3, page: 2 }).expect(200);
    expect(page2.body.items[0].id).not.toBe(spices.body.items[0].id);
    const cherry = await brewer.get('/api/ingredients').query({ q: 'cherr' }).expect(200);
    expect(cherry.body.items[0].id).toBe(house.body.id);
    await brewer.get('/api/ingredients').query({ pageSize: 1000 }).expect(400);
  });

  it('ranks a name whose first part starts with the word first, and opens on the flavour ingredients', async () => {
    const stranger = await signUpOwner(app);
    await stranger.agent
      .post('/api/ingredients')
      .send({ ...label, name: 'Ham glaze with honey', category: 'other' })
      .expect(201);
    await stranger.agent
      .post('/api/ingredients')
      .send({ ...label, name: 'Honey, wildflower', category: 'sugar-syrup' })
      .expect(201);
    const honey = (await stranger.agent.get('/api/ingredients').query({ q: 'honey' }).expect(200)).body.items;
    // Both are house ingredients (they come first); of the two, the one named for honey leads.
    expect(honey.slice(0, 2).map((i: { name: string }) => i.name)).toEqual([
      'Honey, wildflower',
      'Ham glaze with honey',
    ]);
    const first = (await stranger.agent.get('/api/ingredients').query({ pageSize: 60 }).expect(200)).body.items as {
      scope: string;
      category: string;
    }[];
    const dataset = first.filter((i) => i.scope === 'dataset');
    const firstOther = dataset.findIndex((i) => i.category === 'dairy' || i.category === 'other');
    // Every flavour ingredient of the page comes before the first dairy or other food.
    expect(
      dataset
        .slice(firstOther === -1 ? dataset.length : firstOther)
        .every((i) => i.category === 'dairy' || i.category === 'other'),
    ).toBe(true);
    expect(dataset[0].category).not.toBe('other');
  });
});

describe('POST /api/ingredients (house ingredients)', () => {
  it('converts label values per serving to per 100 g', async () => {
    const res = await developer.post('/api/ingredients').send(label).expect(201);
    // By hand: 6.5 g sugars in a 50 g serving = 13 g per 100 g; 30 kcal per 50 g = 60 kcal per 100 g.
    expect(res.body).toMatchObject({
      scope: 'house',
      source: 'house',
      per100g: { sugarsG: 13, energyKcal: 60, fatG: 0.4 },
      fermentableSharePct: 100,
      steepSharePct: 80,
    });
    const changes = await IngredientChange.findAll({ where: { ingredientId: res.body.id } });
    expect(changes.map((c) => c.action)).toEqual(['created']);
  });

  it('converts a serving in mL through its weight', async () => {
    // By hand: 250 mL weighing 260 g with 26 g sugars = 10 g per 100 g.
    const res = await developer
      .post('/api/ingredients')
      .send({
        ...label,
        name: 'House ginger syrup',
        category: 'sugar-syrup',
        servingSize: 250,
        servingUnit: 'ml',
        servingGrams: 260,
        sugarsG: 26,
      })
      .expect(201);
    expect(res.body.per100g.sugarsG).toBeCloseTo(10, 10);
  });

  it.each([
    ['sugars above the serving', { sugarsG: 60 }, 'sugarsG', /cannot weigh more than the serving/],
    ['negative values', { fatG: -1 }, 'fatG', /at least 0/],
    ['a share above 100 %', { fermentableSharePct: 120 }, 'fermentableSharePct', /at most 100/],
    ['a serving in mL without its weight', { servingUnit: 'ml' }, 'servingGrams', /needs its weight/],
    ['an unknown allergen', { allergens: ['celery'] }, 'allergens[0]', /major allergens/],
  ])('refuses %s and creates nothing', async (_what, change, field, message) => {
    const res = await developer
      .post('/api/ingredients')
      .send({ ...label, name: `Refused ${field}`, ...change })
      .expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
    const search = await developer.get('/api/ingredients').query({ q: 'Refused' }).expect(200);
    expect(search.body.total).toBe(0);
  });

  it('refuses a name already used in the brewery, and brewers', async () => {
    await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Twice named purée' })
      .expect(201);
    const res = await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Twice named purée' })
      .expect(409);
    expect(res.body.error.fields.name).toBeDefined();
    await brewer
      .post('/api/ingredients')
      .send({ ...label, name: 'Brewer purée' })
      .expect(403);
  });
});

describe('PUT, archive and copy', () => {
  it('records what changed, and archived ingredients leave search but stay readable', async () => {
    const created = await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Plum purée lot 7' })
      .expect(201);
    await owner
      .put(`/api/ingredients/${created.body.id}`)
      .send({ ...label, name: 'Plum purée lot 7', sugarsG: 7 })
      .expect(200);
    const changes = await developer.get(`/api/ingredients/${created.body.id}/changes`).expect(200);
    expect(changes.body[0]).toMatchObject({ action: 'updated', by: 'Olwen Test', changes: { sugarsG: [13, 14] } });
    await developer.post(`/api/ingredients/${created.body.id}/archive`).send({}).expect(200);
    const after = await developer.get('/api/ingredients').query({ q: 'plum purée lot' }).expect(200);
    expect(after.body.items.map((i: { id: number }) => i.id)).not.toContain(created.body.id);
    const archived = await developer.get('/api/ingredients').query({ q: 'plum', archived: true }).expect(200);
    expect(archived.body.items.map((i: { id: number }) => i.id)).toContain(created.body.id);
    expect((await developer.get(`/api/ingredients/${created.body.id}`).expect(200)).body.archived).toBe(true);
  });

  it('keeps dataset ingredients read-only, but lets them be copied to the house', async () => {
    const honey = (await developer.get('/api/ingredients').query({ q: 'honey' }).expect(200)).body.items.find(
      (i: { name: string }) => i.name === 'Honey',
    );
    await developer
      .put(`/api/ingredients/${honey.id}`)
      .send({ ...label, name: 'Honey' })
      .expect(403);
    await developer.post(`/api/ingredients/${honey.id}/archive`).send({}).expect(403);
    const copy = await developer
      .post(`/api/ingredients/${honey.id}/copy`)
      .send({ name: 'Wildflower honey, local' })
      .expect(201);
    // USDA SR25, NDB 19296 (honey): 82.12 g total sugars per 100 g.
    expect(copy.body).toMatchObject({
      scope: 'house',
      per100g: { sugarsG: 82.12 },
      notes: expect.stringContaining('Copied from Honey'),
    });
  });

  it("hides other breweries' house ingredients", async () => {
    const mine = await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Secret quince purée' })
      .expect(201);
    const stranger = await signUpOwner(app);
    await stranger.agent.get(`/api/ingredients/${mine.body.id}`).expect(404);
    await stranger.agent.put(`/api/ingredients/${mine.body.id}`).send(label).expect(404);
    expect(
      (await stranger.agent.get('/api/ingredients').query({ q: 'quince' }).expect(200)).body.items.map(
        (i: { name: string }) => i.name,
      ),
    ).not.toContain('Secret quince purée');
    const calc = await stranger.agent
      .post('/api/calculations/carbonation')
      .send({ liquidMl: 500, headspaceMl: 25, ingredients: [{ ingredientId: mine.body.id, grams: 10 }] })
      .expect(400);
    expect(calc.body.error.fields['ingredients[0].ingredientId']).toBeDefined();
  });
});

describe('ingredients in POST /api/calculations/carbonation', () => {
  it('counts grams × sugars per gram × the share reaching the liquid, and warns about solids and fat', async () => {
    const strawberry = (
      await developer.get('/api/ingredients').query({ q: 'strawberries raw' }).expect(200)
    ).body.items.find((i: { name: string }) => i.name === 'Strawberries, raw');
    const shortbread = (await developer.get('/api/ingredients').query({ q: 'shortbread' }).expect(200)).body.items[0];
    const res = await developer
      .post('/api/calculations/carbonation')
      .send({
        liquidMl: 500,
        headspaceMl: 25,
        ingredients: [
          { ingredientId: strawberry.id, grams: 100, extractionPct: 50 },
          { ingredientId: shortbread.id, grams: 20, inBottle: true },
        ],
        temperaturesC: [20],
      })
      .expect(200);
    // By hand: 100 g × 0.0489 = 4.89 g from strawberries in the worst case (steeped at 50 %, all of it counts there);
    // shortbread per its USDA record, all of it.
    const shortbreadSugar = 20 * (shortbread.per100g.sugarsG / 100);
    expect(res.body.sugar.fromIngredientsG).toBeCloseTo(4.89 + shortbreadSugar, 4);
    expect(res.body.findings.map((f: { code: string }) => f.code)).toEqual(
      expect.arrayContaining(['solids-in-bottle', 'fatty-ingredients']),
    );
  });
});

describe('PUT /api/ingredients/:id/display-name', () => {
  const find = async (agent: Agent, name: string) =>
    (
      (
        await agent
          .get('/api/ingredients')
          .query({ q: name.split(',')[0], pageSize: 50 })
          .expect(200)
      ).body.items as {
        id: number;
        name: string;
        displayName: string;
      }[]
    ).find((i) => i.name === name)!;

  it('gives dataset ingredients a short name by default, lets the brewery change it, and keeps the full name', async () => {
    const cookies = await find(brewer, 'Cookies, shortbread, commercially prepared, plain');
    expect(cookies.displayName).toBe('Shortbread cookies');
    await brewer
      .put(`/api/ingredients/${cookies.id}/display-name`)
      .send({ displayName: 'Butter biscuits' })
      .expect(403);
    const renamed = await developer
      .put(`/api/ingredients/${cookies.id}/display-name`)
      .send({ displayName: '  Butter shortbread  ' })
      .expect(200);
    expect(renamed.body).toMatchObject({
      name: 'Cookies, shortbread, commercially prepared, plain',
      displayName: 'Butter shortbread',
    });
    expect((await brewer.get(`/api/ingredients/${cookies.id}`).expect(200)).body.displayName).toBe('Butter shortbread');
    // Another brewery still reads the default.
    const stranger = await signUpOwner(app);
    expect((await stranger.agent.get(`/api/ingredients/${cookies.id}`).expect(200)).body.displayName).toBe(
      'Shortbread cookies',
    );
    // Recipes read the brewery's name.
    const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number }[];
    const recipe = await developer
      .post('/api/recipes')
      .send({
        name: 'Biscuit tin',
        content: {
          baseBrew: {
            name: 'base',
            residualSugarGPerL: 0,
            ph: 3.2,
            abvPercent: 0.05,
            residualCo2Volumes: null,
            lastOpenTempC: 21,
          },
          lines: [{ ingredientId: cookies.id, amount: 10, unit: 'g-per-l', extractionPct: 50 }],
          sugars: [],
          process: {
            method: 'steep-strain',
            steepHours: 24,
            steepTempC: 4,
            strainLossPct: 10,
            carbonateHours: 48,
            carbonateTempC: 20,
            coldStoreTempC: 4,
          },
          bottleFormatId: formats[0].id,
          targetVolumes: 2.5,
          sweetnessNote: '',
          highestTempC: 30,
        },
      })
      .expect(201);
    expect(recipe.body.ingredientNames[cookies.id]).toBe('Butter shortbread');
    // Empty goes back to the default; too long is refused with a field message.
    const reset = await developer
      .put(`/api/ingredients/${cookies.id}/display-name`)
      .send({ displayName: '' })
      .expect(200);
    expect(reset.body.displayName).toBe('Shortbread cookies');
    const long = await developer
      .put(`/api/ingredients/${cookies.id}/display-name`)
      .send({ displayName: 'x'.repeat(81) })
      .expect(400);
    expect(long.body.error.fields.displayName).toMatch(/under 80/);
    await developer
      .put(`/api/ingredients/${cookies.id}/display-name`)
      .send({ displayName: { $gt: '' } })
      .expect(400);
    await developer.put('/api/ingredients/999999/display-name').send({ displayName: 'Ghost' }).expect(404);
  });

  it('leaves house ingredients to their own form, and another brewery’s house ingredient is not found', async () => {
    const house = await developer
      .post('/api/ingredients')
      .send({ ...label, name: 'Orchard syrup' })
      .expect(201);
    expect(house.body.displayName).toBe('Orchard syrup');
    const res = await developer
      .put(`/api/ingredients/${house.body.id}/display-name`)
      .send({ displayName: 'Syrup' })
      .expect(409);
    expect(res.body.error.fields.displayName).toBeDefined();
    const stranger = await signUpOwner(app);
    await stranger.agent
      .put(`/api/ingredients/${house.body.id}/display-name`)
      .send({ displayName: 'Mine' })
      .expect(404);
  });

  it('keeps every one of 20 renames sent at once, one row per brewery and ingredient', async () => {
    const lemons = await find(developer, 'Lemons, raw, without peel');
    const results = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        developer.put(`/api/ingredients/${lemons.id}/display-name`).send({ displayName: `Lemon ${i}` }),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(200));
    const rows = await IngredientDisplayName.count({ where: { ingredientId: lemons.id } });
    expect(rows).toBe(1);
  });
});
