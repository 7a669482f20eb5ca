import type { Express } from 'express';

import { Organisation, OutboxMessage } from '@/server/db';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { addMember, type Agent, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let owner2: Agent;
let developer: Agent;
let brewer: Agent;
let developerEmail: string;
let ownerEmail: string;
let safeContent: Record<string, unknown>;
let dangerContent: Record<string, unknown>;

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  const first = await signUpOwner(app);
  owner = first.agent;
  ownerEmail = first.email;
  owner2 = (await addMember(app, owner, 'owner', 'Second Owner')).agent;
  const dev = await addMember(app, owner, 'developer', 'Dev Eloper');
  developer = dev.agent;
  developerEmail = dev.email;
  brewer = (await addMember(app, owner, 'brewer')).agent;
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
  const wine = formats.find((f) => f.name.includes('sparkling-wine'))!.id;
  const crown = formats.find((f) => f.name === 'Glass crown cap 473 mL')!.id;
  const base = {
    name: 'Base',
    residualSugarGPerL: 0.5,
    ph: 3.2,
    abvPercent: 0.05,
    residualCo2Volumes: null,
    lastOpenTempC: 21,
  };
  const process = {
    method: 'steep-strain',
    steepHours: 24,
    steepTempC: 4,
    strainLossPct: 10,
    carbonateHours: 48,
    carbonateTempC: 20,
    coldStoreTempC: 4,
  };
  // 6 bar heavy glass with little sugar: well within rating and limit.
  safeContent = {
    baseBrew: base,
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 2 }],
    process,
    bottleFormatId: wine,
    targetVolumes: 2,
    sweetnessNote: '',
    highestTempC: 25,
  };
  // 3 bar crown cap with 12 g/L of sugar at 35 °C: over the rating and the alcohol limit.
  dangerContent = { ...safeContent, sugars: [{ type: 'sucrose', gPerL: 12 }], bottleFormatId: crown, highestTempC: 35 };
});
afterAll(stopApp);

const make = async (content: Record<string, unknown>, name: string) =>
  (await developer.post('/api/recipes').send({ name, content }).expect(201)).body as { id: number };

describe('review of a recipe version', () => {
  it('goes draft → submitted → approved, e-mails owners then the author, and is recorded', async () => {
    const { id } = await make(safeContent, 'Quince sparkle');
    expect((await brewer.get(`/api/recipes/${id}/review`).expect(200)).body.state).toBe('draft');
    const submitted = await developer
      .post(`/api/recipes/${id}/submit`)
      .send({ version: 1, message: 'Ready for the spring run' })
      .expect(200);
    expect(submitted.body).toMatchObject({ state: 'submitted', submittedVersion: 1 });
    expect(await OutboxMessage.count({ where: { to: ownerEmail, kind: 'review' } })).toBeGreaterThan(0);
    const approved = await owner
      .post(`/api/recipes/${id}/approve`)
      .send({ version: 1, comment: 'Good numbers' })
      .expect(200);
    expect(approved.body).toMatchObject({ state: 'approved', approvedVersion: 1, submittedVersion: null });
    expect(approved.body.events.map((e: { action: string }) => e.action)).toEqual(['approved', 'submitted']);
    const mail = await OutboxMessage.findOne({
      where: { to: developerEmail, kind: 'review' },
      order: [['id', 'DESC']],
    });
    expect(mail?.subject).toBe('Approved: Quince sparkle v1');
    const production = await brewer.get('/api/recipes').query({ status: 'approved' }).expect(200);
    expect(production.body.map((r: { id: number }) => r.id)).toContain(id);
  });

  it('keeps the approved version for production while a new draft is edited', async () => {
    const { id } = await make(safeContent, 'Locked pear');
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(200);
    await developer
      .put(`/api/recipes/${id}`)
      .send({
        name: 'Locked pear',
        baseVersion: 1,
        content: { ...safeContent, sugars: [{ type: 'sucrose', gPerL: 3 }] },
      })
      .expect(200);
    const review = await brewer.get(`/api/recipes/${id}/review`).expect(200);
    expect(review.body).toMatchObject({ state: 'draft', currentVersion: 2, approvedVersion: 1 });
    const scaled = await brewer
      .post(`/api/recipes/${id}/scale`)
      .send({ batch: { kind: 'litres', value: 10 }, version: 1 })
      .expect(200);
    expect(scaled.body.sugars[0]).toMatchObject({ value: 20, unit: 'g' }); // 2 g/L × 10 L, the approved version's sugar
  });

  it('returns with comments, and refuses transitions that do not apply', async () => {
    const { id } = await make(safeContent, 'Returned plum');
    await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(409);
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(409);
    const missing = await owner.post(`/api/recipes/${id}/return`).send({ version: 1, comment: '' }).expect(400);
    expect(missing.body.error.fields.comment).toBeDefined();
    const returned = await owner
      .post(`/api/recipes/${id}/return`)
      .send({ version: 1, comment: 'Less sugar please' })
      .expect(200);
    expect(returned.body.state).toBe('returned');
    expect((await OutboxMessage.findOne({ where: { to: developerEmail }, order: [['id', 'DESC']] }))?.subject).toBe(
      'Changes asked: Returned plum v1',
    );
    await owner.post(`/api/recipes/${id}/withdraw`).send({ reason: 'x' }).expect(409);
    const tooLong = await owner
      .post(`/api/recipes/${id}/return`)
      .send({ version: 1, comment: 'x'.repeat(2001) })
      .expect(400);
    expect(tooLong.body.error.fields.comment).toMatch(/2,000/);
  });

  it('refuses approval when the recipe changed since the owner opened it', async () => {
    const { id } = await make(safeContent, 'Moving target');
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    await developer
      .put(`/api/recipes/${id}`)
      .send({ name: 'Moving target', baseVersion: 1, content: safeContent })
      .expect(200);
    const res = await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(409);
    expect(res.body.error.message).toMatch(/changed since you opened it/);
  });

  it('refuses a version at or over the alcohol limit, override or not, unless the brewery declared it is licensed', async () => {
    const { id } = await make(dangerContent, 'Strong van special');
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    const refused = await owner
      .post(`/api/recipes/${id}/approve`)
      .send({ version: 1, overrideReason: 'We know' })
      .expect(409);
    expect(refused.body.error.code).toBe('alcohol_limit');
    expect(refused.body.error.message).toMatch(/licensed/);
    // Only owners declare it, and who did is recorded.
    await developer
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, licensedForAlcohol: true })
      .expect(403);
    const declared = await owner
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, licensedForAlcohol: true })
      .expect(200);
    expect(declared.body.organisation.licensedForAlcohol).toBe(true);
    const brewery = await Organisation.findByPk(declared.body.organisation.id);
    expect(brewery!.licenceDeclaredById).toBe(declared.body.user.id);
    expect(brewery!.licenceDeclaredAt).toBeInstanceOf(Date);
    // Licensed, the danger still needs its written override.
    await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(409);
    await owner
      .post(`/api/recipes/${id}/approve`)
      .send({ version: 1, overrideReason: 'Sold as a licensed alcoholic product' })
      .expect(200);
    await owner
      .patch('/api/organisation')
      .send({ name: 'Test Ferments', abvLimitPercent: 0.5, licensedForAlcohol: false })
      .expect(200);
  });

  it('blocks approval on a danger finding unless the owner writes why', async () => {
    const { id } = await make({ ...dangerContent, sugars: [{ type: 'sucrose', gPerL: 4 }] }, 'Hot van special');
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    const blocked = await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(409);
    expect(blocked.body.error).toMatchObject({
      code: 'danger_finding',
      fields: { overrideReason: expect.any(String) },
    });
    const approved = await owner
      .post(`/api/recipes/${id}/approve`)
      .send({ version: 1, overrideReason: 'Sold chilled only, delivered in a cold van' })
      .expect(200);
    expect(approved.body.events[0]).toMatchObject({
      action: 'approved',
      overrideReason: 'Sold chilled only, delivered in a cold van',
    });
    // Lists for production carry the approved version's safety level, so the danger is seen before the recipe is opened.
    const production = (await brewer.get('/api/recipes').query({ status: 'approved' }).expect(200)).body as {
      id: number;
      safetyLevel: string;
    }[];
    expect(production.find((r) => r.id === id)?.safetyLevel).toBe('danger');
    const withdrawn = await owner2.post(`/api/recipes/${id}/withdraw`).send({ reason: 'Summer heat' }).expect(200);
    expect(withdrawn.body).toMatchObject({ state: 'draft', approvedVersion: null });
  });

  it('lets nobody approve their own submission while another owner exists', async () => {
    const { id } = (await owner.post('/api/recipes').send({ name: 'Owner made', content: safeContent }).expect(201))
      .body;
    await owner.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    await owner.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(403);
    await owner2.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(200);
  });

  it('records a self-approval by the only owner', async () => {
    const solo = await signUpOwner(app);
    const formats = (await solo.agent.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
    const content = { ...safeContent, bottleFormatId: formats.find((f) => f.name.includes('sparkling-wine'))!.id };
    const { id } = (await solo.agent.post('/api/recipes').send({ name: 'Solo brew', content }).expect(201)).body;
    await solo.agent.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    const res = await solo.agent.post(`/api/recipes/${id}/approve`).send({ version: 1 }).expect(200);
    expect(res.body.events[0]).toMatchObject({ action: 'approved', selfApproved: true });
  });

  it.each([
    ['developer', 'approve'],
    ['developer', 'return'],
    ['developer', 'withdraw'],
    ['brewer', 'submit'],
    ['brewer', 'approve'],
    ['brewer', 'return'],
    ['brewer', 'withdraw'],
  ] as const)('refuses a %s the %s transition (403)', async (role, action) => {
    const { id } = await make(safeContent, `Roles ${role} ${action}`);
    const agent = role === 'developer' ? developer : brewer;
    await agent.post(`/api/recipes/${id}/${action}`).send({ version: 1, comment: 'x', reason: 'x' }).expect(403);
  });

  it('sends no review e-mail to someone who turned them off', async () => {
    await owner2.patch('/api/profile/preferences').send({ notifyReviews: false }).expect(200);
    const { id } = await make(safeContent, 'Quiet one');
    const before = await OutboxMessage.count({ where: { kind: 'review' } });
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    // Two owners, one opted out: one message.
    expect(await OutboxMessage.count({ where: { kind: 'review' } })).toBe(before + 1);
  });
});
