import type { Express } from 'express';
import request from 'supertest';

import { addMember, type Agent, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let brewer: Agent;
beforeAll(async () => {
  app = await startApp();
  owner = (await signUpOwner(app)).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
});
afterAll(stopApp);

const bottle = {
  liquidMl: 500,
  headspaceMl: 25,
  sugars: [{ type: 'sucrose', grams: 3 }],
  residualCo2Volumes: 0.8,
  temperaturesC: [4, 20, 35],
  maxWorkingPressureBar: 3,
};

describe('POST /api/calculations/carbonation', () => {
  it('answers sugar, CO2, alcohol, pressures, findings and assumptions for any signed-in role', async () => {
    const res = await brewer.post('/api/calculations/carbonation').send(bottle).expect(200);
    expect(res.body.sugar).toMatchObject({ fermentableG: 3, fermentableGPerL: 6, sweetOnlyG: 0 });
    // Worked by hand in tests/lib/chemistry/pressure.test.ts: 1.5715 volumes from 6 g/L sucrose, 0.409 % ABV.
    expect(res.body.co2.fromSugarVolumes).toBeCloseTo(1.5715, 3);
    expect(res.body.co2.residualVolumes).toBe(0.8);
    expect(res.body.alcohol.addedAbvPercent).toBeCloseTo(0.409, 3);
    expect(res.body.pressures).toHaveLength(3);
    expect(res.body.pressures[0]).toEqual({
      tempC: 4,
      gaugeBar: expect.any(Number),
      gaugePsi: expect.any(Number),
      dissolvedVolumes: expect.any(Number),
      co2PartialAtm: expect.any(Number),
      headspaceMl: expect.any(Number),
      liquidFills: false,
      overRating: false,
    });
    expect(res.body.findings.map((f: { code: string }) => f.code)).toEqual(
      expect.arrayContaining(['pressure-over-rating', 'alcohol-near-limit']),
    );
    expect(res.body.assumptions.map((a: { source: string }) => a.source).join(' ')).toMatch(/Weiss \(1974\)/);
    await request(app).post('/api/calculations/carbonation').send(bottle).expect(401);
  });

  it('takes the rating and headspace of a bottle format of the brewery', async () => {
    const formats = (await owner.get('/api/bottle-formats').expect(200)).body as {
      id: number;
      name: string;
      headspaceMl: number;
      maxWorkingPressureBar: number;
    }[];
    const wine = formats.find((f) => f.name.includes('sparkling-wine'))!;
    const res = await owner
      .post('/api/calculations/carbonation')
      .send({ liquidMl: 750, sugars: [{ type: 'sucrose', grams: 4 }], bottleFormatId: wine.id })
      .expect(200);
    expect(res.body.bottleFormat).toMatchObject({ id: wine.id, maxWorkingPressureBar: 6 });
    expect(res.body.findings.find((f: { code: string }) => f.code.startsWith('pressure'))).toMatchObject({
      level: 'ok',
      values: { ratingBar: 6 },
    });
  });

  it('refuses a missing headspace unless a bottle format gives it', async () => {
    const { headspaceMl: _, ...noHeadspace } = bottle;
    const refused = await owner.post('/api/calculations/carbonation').send(noHeadspace).expect(400);
    expect(refused.body.error.fields.headspaceMl).toMatch(/headspace/);
    const priming = await owner
      .post('/api/calculations/priming')
      .send({ liquidMl: 500, targetVolumes: 2.5 })
      .expect(400);
    expect(priming.body.error.fields.headspaceMl).toBeDefined();
    const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; headspaceMl: number }[];
    const withFormat = await owner
      .post('/api/calculations/carbonation')
      .send({ ...noHeadspace, bottleFormatId: formats[0].id })
      .expect(200);
    // The format's headspace, as filled: at the sealing temperature the gas space is exactly that.
    expect(withFormat.body.pressures.find((p: { tempC: number }) => p.tempC === 20)?.headspaceMl).toBeCloseTo(
      formats[0].headspaceMl,
      6,
    );
  });

  it('refuses a bottle format of another brewery', async () => {
    const stranger = await signUpOwner(app);
    const theirs = (await stranger.agent.get('/api/bottle-formats').expect(200)).body[0].id;
    const res = await owner
      .post('/api/calculations/carbonation')
      .send({ ...bottle, bottleFormatId: theirs })
      .expect(400);
    expect(res.body.error.fields.bottleFormatId).toBeDefined();
  });

  it('uses the brewery alcohol limit, which an owner can change', async () => {
    const strict = await signUpOwner(app);
    await strict.agent.patch('/api/organisation').send({ name: 'Strict Ferments', abvLimitPercent: 1.2 }).expect(200);
    const res = await strict.agent
      .post('/api/calculations/carbonation')
      .send({ ...bottle, baseAbvPercent: 0.5 })
      .expect(200);
    expect(res.body.findings.find((f: { code: string }) => f.code.startsWith('alcohol'))).toMatchObject({
      level: 'ok',
      values: { limitAbvPercent: 1.2 },
    });
  });

  it.each([
    ['negative', { ...bottle, liquidMl: -5 }, 'liquidMl', /more than 0/],
    ['missing', { sugars: [] }, 'liquidMl', /Enter the liquid/],
    ['absurd', { ...bottle, liquidMl: 1e9 }, 'liquidMl', /at most/],
    ['wrong type', { ...bottle, liquidMl: 'five hundred' }, 'liquidMl', /must be a number/],
    ['a string number', { ...bottle, headspaceMl: '25' }, 'headspaceMl', /must be a number/],
    ['an unknown sugar', { ...bottle, sugars: [{ type: 'molasses', grams: 3 }] }, 'sugars[0].type', /Choose one of/],
    ['negative sugar', { ...bottle, sugars: [{ type: 'sucrose', grams: -1 }] }, 'sugars[0].grams', /at least 0/],
    ['an absurd temperature', { ...bottle, temperaturesC: [4, 400] }, 'temperaturesC[1]', /at most 60/],
    ['a temperature just over 60 °C', { ...bottle, temperaturesC: [4, 60.1] }, 'temperaturesC[1]', /at most 60/],
    ['a temperature just under −5 °C', { ...bottle, sealedTempC: -5.1 }, 'sealedTempC', /at least -5/],
    ['no temperature', { ...bottle, temperaturesC: [] }, 'temperaturesC', /at least one/],
    ['an absurd residual', { ...bottle, residualCo2Volumes: 40 }, 'residualCo2Volumes', /at most 6/],
    ['a wrong yield', { ...bottle, yield: 'best' }, 'yield', /worst or expected/],
    [
      'an unknown ingredient',
      { ...bottle, ingredients: [{ ingredientId: 999, grams: 10 }] },
      'ingredients[0].ingredientId',
      /No such ingredient/,
    ],
  ])('answers 400 naming the field for %s', async (_what, body, field, message) => {
    const res = await owner.post('/api/calculations/carbonation').send(body).expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
  });

  it('flags danger for pressure over the rating and alcohol over the limit', async () => {
    const res = await owner
      .post('/api/calculations/carbonation')
      .send({ ...bottle, sugars: [{ type: 'sucrose', grams: 8 }] })
      .expect(200);
    const levels = Object.fromEntries(res.body.findings.map((f: { code: string; level: string }) => [f.code, f.level]));
    expect(levels).toMatchObject({ 'pressure-over-rating': 'danger', 'alcohol-over-limit': 'danger' });
  });

  it('flags temperatures outside the model and solids left in the bottle', async () => {
    const res = await owner
      .post('/api/calculations/carbonation')
      .send({ ...bottle, temperaturesC: [-5, 20], solidsInBottle: true })
      .expect(200);
    expect(res.body.findings.map((f: { code: string }) => f.code)).toEqual(
      expect.arrayContaining(['temperature-out-of-range', 'solids-in-bottle']),
    );
  });
});

describe('POST /api/calculations/priming', () => {
  it('answers the sugar for a target, its alcohol, and the most sugar the bottle allows', async () => {
    const res = await owner
      .post('/api/calculations/priming')
      .send({
        liquidMl: 500,
        headspaceMl: 25,
        targetVolumes: 2.5,
        residualCo2Volumes: 0.9,
        sugarType: 'sucrose',
        maxWorkingPressureBar: 3,
        highestTempC: 35,
      })
      .expect(200);
    // By hand: (2.5 − 0.9) × 1.9635 g/L ÷ 0.51428 = 6.109 g/L sucrose, 3.054 g per 500 mL.
    expect(res.body.sugarG).toBeCloseTo(3.054, 2);
    expect(res.body.sugarGPerL).toBeCloseTo(6.109, 2);
    expect(res.body.addedAbvPercent).toBeGreaterThan(0.4);
    expect(res.body.maxSafeSugarG).toBeGreaterThan(0);
    expect(res.body.findings.length).toBeGreaterThan(0);
  });

  it('refuses lactose and a missing target', async () => {
    const lactose = await owner
      .post('/api/calculations/priming')
      .send({ liquidMl: 500, headspaceMl: 25, targetVolumes: 2.5, sugarType: 'lactose' })
      .expect(400);
    expect(lactose.body.error.fields.sugarType).toBeDefined();
    const missing = await owner.post('/api/calculations/priming').send({ liquidMl: 500, headspaceMl: 25 }).expect(400);
    expect(missing.body.error.fields.targetVolumes).toBeDefined();
  });
});

describe('POST /api/calculations/brix', () => {
  it('converts Brix to specific gravity and sugar, and back', async () => {
    // CRC Handbook, sucrose 10 % by mass: 1.0381 g/mL at 20 °C → SG 20/20 1.0400, 103.8 g/L.
    const res = await owner.post('/api/calculations/brix').send({ brix: 10 }).expect(200);
    expect(res.body.specificGravity).toBeCloseTo(1.04, 3);
    expect(res.body.sugarGPerL).toBeCloseTo(103.8, 0);
    expect(res.body.caution).toMatch(/estimate/);
    const back = await owner.post('/api/calculations/brix').send({ specificGravity: 1.04 }).expect(200);
    expect(back.body.brix).toBeCloseTo(10, 1);
  });

  it('wants exactly one reading', async () => {
    expect((await owner.post('/api/calculations/brix').send({}).expect(400)).body.error.fields.brix).toBeDefined();
    expect(
      (await owner.post('/api/calculations/brix').send({ brix: 5, specificGravity: 1.02 }).expect(400)).body.error
        .fields.specificGravity,
    ).toBeDefined();
    expect(
      (await owner.post('/api/calculations/brix').send({ brix: -2 }).expect(400)).body.error.fields.brix,
    ).toBeDefined();
  });
});

describe('/api/bottle-formats', () => {
  it('starts every brewery with the starter set, marked as typical values', async () => {
    const res = await brewer.get('/api/bottle-formats').expect(200);
    expect(res.body.length).toBeGreaterThanOrEqual(7);
    expect(res.body.every((f: { pressureSource: string }) => /confirm with your supplier/.test(f.pressureSource))).toBe(
      true,
    );
    expect(res.body.map((f: { name: string }) => f.name)).toEqual(
      expect.arrayContaining(['Glass crown cap 330 mL', 'Swing top glass 1 L', 'PET 500 mL']),
    );
  });

  it('lets owners add, edit and archive formats, and nobody else', async () => {
    const input = {
      name: 'Squat glass 250 mL',
      liquidMl: 250,
      headspaceMl: 15,
      closure: 'crown-cap',
      material: 'glass',
      maxWorkingPressureBar: 3.5,
      pressureSource: 'Supplier sheet 2026-03',
      notes: null,
    };
    await brewer.post('/api/bottle-formats').send(input).expect(403);
    const created = await owner.post('/api/bottle-formats').send(input).expect(201);
    await owner.post('/api/bottle-formats').send(input).expect(409);
    const edited = await owner
      .put(`/api/bottle-formats/${created.body.id}`)
      .send({ ...input, maxWorkingPressureBar: 4 })
      .expect(200);
    expect(edited.body.maxWorkingPressureBar).toBe(4);
    await brewer.put(`/api/bottle-formats/${created.body.id}`).send(input).expect(403);
    await owner.post(`/api/bottle-formats/${created.body.id}/archive`).send({}).expect(200);
    const names = (await owner.get('/api/bottle-formats').expect(200)).body.map((f: { name: string }) => f.name);
    expect(names).not.toContain('Squat glass 250 mL');
    const all = (await owner.get('/api/bottle-formats?archived=true').expect(200)).body.map(
      (f: { name: string }) => f.name,
    );
    expect(all).toContain('Squat glass 250 mL');
  });

  it('validates every field', async () => {
    const res = await owner
      .post('/api/bottle-formats')
      .send({ name: '', liquidMl: 0, headspaceMl: -1, closure: 'cork', material: 'tin', maxWorkingPressureBar: 100 })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'closure',
      'headspaceMl',
      'liquidMl',
      'material',
      'maxWorkingPressureBar',
      'name',
      'pressureSource',
    ]);
  });
});

describe('PATCH /api/profile/preferences', () => {
  it('remembers the unit system per person', async () => {
    const res = await brewer.patch('/api/profile/preferences').send({ unitSystem: 'us' }).expect(200);
    expect(res.body.user.unitSystem).toBe('us');
    expect((await brewer.get('/api/auth/session').expect(200)).body.user.unitSystem).toBe('us');
    await brewer.patch('/api/profile/preferences').send({ unitSystem: 'imperial' }).expect(400);
  });
});

describe('PATCH /api/organisation', () => {
  it('is for owners only and validates the limit', async () => {
    await brewer.patch('/api/organisation').send({ name: 'X Brew', abvLimitPercent: 1 }).expect(403);
    const res = await owner.patch('/api/organisation').send({ name: 'Test Ferments', abvLimitPercent: 0 }).expect(400);
    expect(res.body.error.fields.abvLimitPercent).toBeDefined();
  });
});

describe('the brewery warm day (PATCH /api/organisation)', () => {
  it('is 35 °C until an owner changes it, and every calculation of the brewery then checks it', async () => {
    const cold = { ...bottle, temperaturesC: [4, 10] };
    const before = await brewer.post('/api/calculations/carbonation').send(cold).expect(200);
    expect(before.body.warmDayTempC).toBe(35);
    await brewer
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, warmestTempC: 40 })
      .expect(403);
    const saved = await owner
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, warmestTempC: 40 })
      .expect(200);
    expect(saved.body.organisation.warmestTempC).toBe(40);
    const after = await brewer.post('/api/calculations/carbonation').send(cold).expect(200);
    expect(after.body.pressures.map((p: { tempC: number }) => p.tempC)).toEqual([4, 10, 40]);
    const bad = await owner
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, warmestTempC: '40' })
      .expect(400);
    expect(bad.body.error.fields.warmestTempC).toMatch(/must be a number/);
  });
});

describe('the brewery margin for the most sugar (PATCH /api/organisation)', () => {
  it('is 80 % of the rating until an owner changes it; a save that leaves a setting out keeps it', async () => {
    const brewery = await signUpOwner(app);
    // Judged at the sealing temperature (warmest set to 20 °C), where the gauge reads the CO2 pressure alone.
    await brewery.agent
      .patch('/api/organisation')
      .send({ name: 'Margin Ferments', abvLimitPercent: 0.5, warmestTempC: 20 })
      .expect(200);
    const ask = {
      liquidMl: 500,
      headspaceMl: 25,
      targetVolumes: 3,
      residualCo2Volumes: 0.9,
      sealedTempC: 20,
      highestTempC: 20,
      maxWorkingPressureBar: 3,
      abvLimitPercent: 5,
    };
    // Worked by hand in tests/lib/chemistry/pressure.test.ts: 80 % of 3 bar leaves room for 2.4625 g of sucrose.
    const at80 = await brewery.agent.post('/api/calculations/priming').send(ask).expect(200);
    expect(at80.body.ratingShare).toBe(0.8);
    expect(Math.abs(at80.body.maxSafeSugarG - 2.4625) / 2.4625).toBeLessThan(0.01);
    // 60 %: 1.8 bar = 1.77646 atm × 0.0206253 mol/atm = 0.036640 mol, less 0.020077 mol already in the base =
    // 0.016563 mol of CO2 from sugar = 0.016563 ÷ 4 × 342.297 g = 1.4174 g of sucrose.
    const saved = await brewery.agent
      .patch('/api/organisation')
      .send({ name: 'Margin Ferments', abvLimitPercent: 0.5, ratingSharePercent: 60 })
      .expect(200);
    expect(saved.body.organisation).toMatchObject({ ratingSharePercent: 60, warmestTempC: 20 });
    const at60 = await brewery.agent.post('/api/calculations/priming').send(ask).expect(200);
    expect(Math.abs(at60.body.maxSafeSugarG - 1.4174) / 1.4174).toBeLessThan(0.01);
    for (const ratingSharePercent of [49, 101, '80']) {
      const bad = await brewery.agent
        .patch('/api/organisation')
        .send({ name: 'Margin Ferments', abvLimitPercent: 0.5, ratingSharePercent })
        .expect(400);
      expect(bad.body.error.fields.ratingSharePercent).toBeDefined();
    }
  });
});
