import type { Express } from 'express';

import { OutboxMessage } from '@/server/db';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { addMember, type Agent, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let ownerEmail: string;
let developer: Agent;
let brewer: Agent;
let stranger: Agent;
let approvedId: number;
let draftId: number;

const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  const first = await signUpOwner(app);
  owner = first.agent;
  ownerEmail = first.email;
  developer = (await addMember(app, owner, 'developer', 'Dev Eloper')).agent;
  brewer = (await addMember(app, owner, 'brewer', 'Bree Wer')).agent;
  stranger = (await signUpOwner(app)).agent;
  await owner
    .patch('/api/organisation')
    .send({ name: 'Test Ferments', abvLimitPercent: 0.5, lotPrefix: 'TF' })
    .expect(200);
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
  const wine = formats.find((f) => f.name.includes('sparkling-wine'))!.id;
  const content = {
    baseBrew: {
      name: 'Base',
      residualSugarGPerL: 0.5,
      ph: 3.2,
      abvPercent: 0.05,
      residualCo2Volumes: null,
      lastOpenTempC: 21,
    },
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 2 }],
    process: {
      method: 'steep-strain',
      steepHours: 24,
      steepTempC: 4,
      strainLossPct: 10,
      carbonateHours: 48,
      carbonateTempC: 20,
      coldStoreTempC: 4,
    },
    bottleFormatId: wine,
    targetVolumes: 2,
    sweetnessNote: '',
    highestTempC: 25,
  };
  approvedId = (await developer.post('/api/recipes').send({ name: 'Quince sparkle', content }).expect(201)).body.id;
  await developer.post(`/api/recipes/${approvedId}/submit`).send({ version: 1 }).expect(200);
  await owner.post(`/api/recipes/${approvedId}/approve`).send({ version: 1 }).expect(200);
  draftId = (await developer.post('/api/recipes').send({ name: 'Pear trial', content }).expect(201)).body.id;
});
afterAll(stopApp);

const start = (agent: Agent, body: Record<string, unknown>) =>
  agent.post('/api/batches').send({ batch: { kind: 'bottles', value: 24 }, ...body });

describe('starting a batch', () => {
  it('needs the approved version for production, and gives a lot code of prefix, date and sequence', async () => {
    const res = await start(brewer, { recipeId: approvedId, version: 1 }).expect(201);
    const d = new Date();
    const day = `${String(d.getUTCFullYear()).slice(2)}${String(d.getUTCMonth() + 1).padStart(2, '0')}${String(d.getUTCDate()).padStart(2, '0')}`;
    expect(res.body.lotCode).toMatch(new RegExp(`^TF-${day}-\\d{2}$`));
    expect(res.body).toMatchObject({
      state: 'in-progress',
      trial: false,
      recipeName: 'Quince sparkle',
      version: 1,
      bottles: 24,
    });
    expect(res.body.steps.length).toBeGreaterThan(2);
    expect(res.body.card.code).toBe(res.body.lotCode);
    const refused = await start(brewer, { recipeId: draftId, version: 1 }).expect(409);
    expect(refused.body.error).toMatchObject({ code: 'not_approved', message: expect.stringMatching(/Start a trial/) });
  });

  it('follows the role table: production for owners and brewers, trials for owners and developers', async () => {
    await start(developer, { recipeId: approvedId, version: 1 }).expect(403);
    await start(brewer, { recipeId: draftId, version: 1, trial: true }).expect(403);
    const trial = await start(developer, { recipeId: draftId, version: 1, trial: true }).expect(201);
    expect(trial.body.trial).toBe(true);
    await start(owner, { recipeId: approvedId, version: 1 }).expect(201);
    // Developers read production batches but do not record on them.
    const production = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body.id;
    await developer.get(`/api/batches/${production}`).expect(200);
    await developer
      .post(`/api/batches/${production}/readings`)
      .send({ kind: 'ph', value: 3.1, stage: 'base' })
      .expect(403);
  });

  it('gives 20 batches started at once 20 different lot codes', async () => {
    const results = await Promise.all(
      Array.from({ length: 20 }, () => start(brewer, { recipeId: approvedId, version: 1 })),
    );
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(201));
    expect(new Set(results.map((r) => r.body.lotCode)).size).toBe(20);
  });

  it('is 404 for another brewery, and refuses bad bodies naming the field', async () => {
    const id = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body.id;
    await stranger.get(`/api/batches/${id}`).expect(404);
    await stranger.post(`/api/batches/${id}/readings`).send({ kind: 'ph', value: 3, stage: 'base' }).expect(404);
    await start(stranger, { recipeId: approvedId, version: 1 }).expect(404);
    const bad = await brewer
      .post('/api/batches')
      .send({ recipeId: '1', version: 1, batch: { kind: 'bottles', value: 24 } })
      .expect(400);
    expect(bad.body.error.fields.recipeId).toMatch(/must be a number/);
  });
});

describe('readings', () => {
  let id: number;
  beforeAll(async () => {
    id = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body.id;
  });

  it('are checked as they are entered, and a danger tells the owners', async () => {
    const before = await OutboxMessage.count({ where: { to: ownerEmail, kind: 'batch' } });
    const ph = await brewer
      .post(`/api/batches/${id}/readings`)
      .send({ kind: 'ph', value: 4.4, stage: 'base' })
      .expect(201);
    expect(ph.body.check).toMatchObject({ level: 'danger', message: expect.stringMatching(/add starter and re-test/) });
    expect(await OutboxMessage.count({ where: { to: ownerEmail, kind: 'batch' } })).toBe(before + 1);
    const bottle = await brewer
      .post(`/api/batches/${id}/readings`)
      .send({ kind: 'gauge-pressure', value: 1.2, tempC: 20, stage: 'conditioning' })
      .expect(201);
    expect(bottle.body.check.level).toBe('ok');
    expect(bottle.body.check.predictedGaugeBar).toBeGreaterThan(1.2);
  });

  it('takes 20 readings sent at once, every one stored', async () => {
    const before = (await brewer.get(`/api/batches/${id}`).expect(200)).body.readings.length;
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        brewer
          .post(`/api/batches/${id}/readings`)
          .send({ kind: 'temperature', value: 20 + i / 10, stage: 'conditioning' }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual(Array(20).fill(201));
    expect((await brewer.get(`/api/batches/${id}`).expect(200)).body.readings.length).toBe(before + 20);
  });

  it('refuses values out of range, strings and a pressure without its temperature, changing nothing', async () => {
    const count = async () => (await brewer.get(`/api/batches/${id}`).expect(200)).body.readings.length;
    const n = await count();
    for (const [body, field] of [
      [{ kind: 'ph', value: 15, stage: 'base' }, 'value'],
      [{ kind: 'ph', value: '3.2', stage: 'base' }, 'value'],
      [{ kind: 'gauge-pressure', value: -1, tempC: 20, stage: 'conditioning' }, 'value'],
      [{ kind: 'temperature', value: 101, stage: 'conditioning' }, 'value'],
      [{ kind: 'gauge-pressure', value: 2, stage: 'conditioning' }, 'tempC'],
      [{ kind: 'density', value: 1, stage: 'base' }, 'kind'],
      [{ kind: 'ph', value: 3, stage: 'bottled' }, 'stage'],
    ] as const) {
      const res = await brewer.post(`/api/batches/${id}/readings`).send(body).expect(400);
      expect(res.body.error.fields[field]).toBeDefined();
    }
    expect(await count()).toBe(n);
  });

  it('holds the batch when the ABV is at the limit, and keeps the lab report with the reading', async () => {
    const abv = await brewer
      .post(`/api/batches/${id}/readings`)
      .send({ kind: 'abv', value: 0.5, stage: 'finished', source: 'lab' })
      .expect(201);
    expect(abv.body.check.level).toBe('danger');
    const report = await brewer
      .post(`/api/batches/${id}/readings/${abv.body.id}/report`)
      .attach('file', PDF, 'lab-report.pdf')
      .expect(201);
    expect(report.body).toMatchObject({ name: 'lab-report.pdf', mimeType: 'application/pdf' });
    const detail = (await owner.get(`/api/batches/${id}`).expect(200)).body;
    expect(detail.state).toBe('held');
    expect(detail.readings.find((r: { id: number }) => r.id === abv.body.id).reports).toHaveLength(1);
    await owner.delete(`/api/attachments/${report.body.id}`).send({}).expect(409);
    await brewer
      .post(`/api/batches/${id}/readings/${abv.body.id}/report`)
      .attach('file', Buffer.from('not a pdf'), 'x.pdf')
      .expect(400);
  });
});

describe('ingredient lots, steps, deviations and the decision', () => {
  it('parses quantities as written, traces a supplier lot, and refuses what is not a quantity', async () => {
    const id = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body.id;
    const lot = await brewer
      .post(`/api/batches/${id}/ingredient-lots`)
      .send({ ingredientName: 'Quince purée', supplier: 'Orchard Co-op', supplierLot: 'QP-2611-7', quantity: '5 lb' })
      .expect(201);
    // 5 lb × 453.59237 g (NIST SP 811, exact) = 2267.96 g.
    expect(lot.body).toMatchObject({ quantity: '5 lb', quantityUnit: 'g' });
    expect(lot.body.quantityValue).toBeCloseTo(2267.96, 2);
    const bad = await brewer
      .post(`/api/batches/${id}/ingredient-lots`)
      .send({ ingredientName: 'Quince purée', supplierLot: 'QP-2611-7', quantity: 'a bucket' })
      .expect(400);
    expect(bad.body.error.fields.quantity).toMatch(/e\.g\. "2 kg"/);
    const hits = (await owner.get('/api/batches/trace').query({ supplierLot: 'QP-2611-7' }).expect(200)).body;
    expect(hits.map((h: { batch: { id: number } }) => h.batch.id)).toContain(id);
    expect((await stranger.get('/api/batches/trace').query({ supplierLot: 'QP-2611-7' }).expect(200)).body).toEqual([]);
  });

  it('waits for a decision once every step is signed; release is refused while a danger stands, unless the owner says why', async () => {
    const started = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body;
    const id = started.id;
    const danger = await brewer
      .post(`/api/batches/${id}/readings`)
      .send({ kind: 'gauge-pressure', value: 6.2, tempC: 20, stage: 'conditioning' })
      .expect(201);
    expect(danger.body.check.level).toBe('danger');
    for (const step of started.steps)
      await brewer.post(`/api/batches/${id}/steps/${step.number}`).send({ note: '' }).expect(200);
    await brewer.post(`/api/batches/${id}/steps/1`).send({}).expect(409);
    const waiting = (await owner.get(`/api/batches/${id}`).expect(200)).body;
    expect(waiting.state).toBe('awaiting-decision');
    expect(waiting.standingDangers).toEqual([danger.body.id]);
    expect(
      await OutboxMessage.count({
        where: { to: ownerEmail, subject: `Batch waits for your decision: ${started.lotCode}` },
      }),
    ).toBe(1);
    await brewer.post(`/api/batches/${id}/release`).send({ decision: 'released', note: '' }).expect(403);
    const refused = await owner.post(`/api/batches/${id}/release`).send({ decision: 'released', note: '' }).expect(409);
    expect(refused.body.error.code).toBe('danger_standing');
    await owner
      .post(`/api/batches/${id}/release`)
      .send({ decision: 'held', note: 'Re-test after chilling' })
      .expect(200);
    await brewer
      .post(`/api/batches/${id}/deviations`)
      .send({
        whatHappened: 'Test bottle at 6.2 bar',
        actionTaken: 'Chilled every bottle to 4 °C overnight',
        closesReadingId: danger.body.id,
      })
      .expect(201);
    const released = await owner
      .post(`/api/batches/${id}/release`)
      .send({ decision: 'released', note: 'Chilled; re-tested fine' })
      .expect(200);
    expect(released.body).toMatchObject({ state: 'released', standingDangers: [] });
    await brewer.post(`/api/batches/${id}/readings`).send({ kind: 'ph', value: 3.1, stage: 'finished' }).expect(409);
    const pdf = await owner.get(`/api/batches/${id}/record.pdf`).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
  });

  it('releases over a standing danger only with a written reason, and never a trial', async () => {
    const id = (await start(brewer, { recipeId: approvedId, version: 1 }).expect(201)).body.id;
    await brewer.post(`/api/batches/${id}/readings`).send({ kind: 'ph', value: 4.5, stage: 'base' }).expect(201);
    const over = await owner
      .post(`/api/batches/${id}/release`)
      .send({ decision: 'released', note: '', overrideReason: 'Base re-tested by the lab at pH 3.4; meter fault' })
      .expect(200);
    expect(over.body.decisions.at(-1)).toMatchObject({
      decision: 'released',
      overrideReason: 'Base re-tested by the lab at pH 3.4; meter fault',
    });
    const trial = (await start(developer, { recipeId: draftId, version: 1, trial: true }).expect(201)).body.id;
    const refused = await owner
      .post(`/api/batches/${trial}/release`)
      .send({ decision: 'released', note: '' })
      .expect(409);
    expect(refused.body.error.code).toBe('trial_batch');
    await owner.post(`/api/batches/${trial}/release`).send({ decision: 'discarded', note: 'Too sharp' }).expect(200);
  });

  it('lists batches by state and lot, in pages, and opens one by its lot code', async () => {
    const page = (await developer.get('/api/batches').query({ state: 'all', pageSize: 5 }).expect(200)).body;
    expect(page.items).toHaveLength(5);
    expect(page.total).toBeGreaterThan(20);
    const one = page.items[0];
    const found = (await brewer.get(`/api/batches/lot/${one.lotCode}`).expect(200)).body;
    expect(found.id).toBe(one.id);
    const released = (await owner.get('/api/batches').query({ state: 'released' }).expect(200)).body.items;
    expect(released.every((b: { state: string }) => b.state === 'released')).toBe(true);
    await stranger.get(`/api/batches/lot/${one.lotCode}`).expect(404);
  });
});
