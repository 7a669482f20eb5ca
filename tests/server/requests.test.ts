import fs from 'node:fs';

import type { Express } from 'express';
import request from 'supertest';

let app: Express;
let helpers: typeof import('./helpers');
let config: typeof import('@/server/config').config;
let db: typeof import('@/server/db');
let owner: import('./helpers').Agent;
let developer: import('./helpers').Agent;
let brewer: import('./helpers').Agent;
let content: Record<string, unknown>;
let ingredientId: number;

const PDF = (bytes: number) => Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(bytes - 9, 0x20)]);

beforeAll(async () => {
  process.env.UPLOAD_QUOTA_MB = String(3 / 1024); // 3 KB, so the quota is reached with small files
  helpers = require('./helpers');
  config = require('@/server/config').config;
  db = require('@/server/db');
  app = await helpers.startApp();
  owner = (await helpers.signUpOwner(app)).agent;
  developer = (await helpers.addMember(app, owner, 'developer')).agent;
  brewer = (await helpers.addMember(app, owner, 'brewer')).agent;
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
  content = {
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
    bottleFormatId: formats.find((f) => f.name.includes('sparkling-wine'))!.id,
    targetVolumes: 2,
    sweetnessNote: '',
    highestTempC: 25,
  };
  ingredientId = (
    await developer
      .post('/api/ingredients')
      .send({
        name: 'Quota syrup',
        category: 'puree',
        servingSize: 100,
        sugarsG: 60,
        fermentableSharePct: 100,
        steepSharePct: 100,
      })
      .expect(201)
  ).body.id;
});
afterAll(async () => {
  await helpers.stopApp();
  fs.rmSync(config.uploadsDir, { recursive: true, force: true });
});

describe('state-changing requests from another site', () => {
  const archive = (agent: typeof owner) => agent.post('/api/ingredients/999999/archive');

  it('are refused with 403 by Origin or Sec-Fetch-Site; the app itself and programs pass', async () => {
    const refused = await archive(owner).set('Origin', 'https://elsewhere.example').send({}).expect(403);
    expect(refused.body.error.code).toBe('cross_site');
    await archive(owner).set('Origin', 'null').send({}).expect(403);
    await archive(owner).set('Sec-Fetch-Site', 'cross-site').send({}).expect(403);
    await archive(owner).set('Sec-Fetch-Site', 'same-site').send({}).expect(403);
    await archive(owner)
      .set('Origin', 'http://fizzwright.test')
      .set('Sec-Fetch-Site', 'same-origin')
      .send({})
      .expect(404);
    await archive(owner).send({}).expect(404);
    // Reads are not refused (they change nothing and CORS keeps their answers from other sites).
    await owner.get('/api/auth/session').set('Origin', 'https://elsewhere.example').expect(200);
  });

  it('refuse a body that is not JSON, even an empty one, and multipart away from the upload route', async () => {
    await archive(owner).expect(415);
    await archive(owner).set('Content-Type', 'text/plain').send('').expect(415);
    await archive(owner).set('Content-Type', 'application/x-www-form-urlencoded').send('a=1').expect(415);
    await archive(owner).attach('file', PDF(100), 'a.pdf').expect(415);
    await owner.post(`/api/ingredients/${ingredientId}/attachments`).send({}).expect(415);
  });

  it('API answers carry Cache-Control: no-store', async () => {
    expect((await owner.get('/api/auth/session').expect(200)).headers['cache-control']).toBe('no-store');
    expect((await request(app).get('/api/nothing-here').expect(404)).headers['cache-control']).toBe('no-store');
  });
});

describe('many writers at once', () => {
  it('twenty people saving their own recipes at once all succeed, and twenty saves of one version give one 200 and nineteen 409s', async () => {
    const ids = await Promise.all(
      Array.from(
        { length: 20 },
        async (_, i) =>
          (
            await developer
              .post('/api/recipes')
              .send({ name: `Crowd ${i}`, content })
              .expect(201)
          ).body.id as number,
      ),
    );
    const saves = await Promise.all(
      ids.map((id, i) =>
        developer
          .put(`/api/recipes/${id}`)
          .send({ name: `Crowd ${i}`, flavourNotes: '', baseVersion: 1, note: 'Saved in a crowd', content }),
      ),
    );
    expect(saves.map((s) => s.status)).toEqual(Array(20).fill(200));
    const one = ids[0];
    const same = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        developer
          .put(`/api/recipes/${one}`)
          .send({ name: 'Crowd 0', flavourNotes: '', baseVersion: 2, note: `Race ${i}`, content }),
      ),
    );
    expect(same.map((s) => s.status).sort()).toEqual([200, ...Array(19).fill(409)]);
    expect(await db.RecipeVersion.count({ where: { recipeId: one } })).toBe(3);
  });

  it('ten identical approvals at once make one event; ten submissions at once make one', async () => {
    const id = (await developer.post('/api/recipes').send({ name: 'Raced', content }).expect(201)).body.id as number;
    const submits = await Promise.all(
      Array.from({ length: 10 }, () => developer.post(`/api/recipes/${id}/submit`).send({ version: 1, message: '' })),
    );
    expect(submits.map((s) => s.status).sort()).toEqual([200, ...Array(9).fill(409)]);
    const approvals = await Promise.all(
      Array.from({ length: 10 }, () => owner.post(`/api/recipes/${id}/approve`).send({ version: 1, comment: 'ok' })),
    );
    expect(approvals.map((s) => s.status).sort()).toEqual([200, ...Array(9).fill(409)]);
    const events = await db.RecipeReview.findAll({ where: { recipeId: id } });
    expect(events.map((e) => e.action).sort()).toEqual(['approved', 'submitted']);
    const withdrawals = await Promise.all(
      Array.from({ length: 10 }, () => owner.post(`/api/recipes/${id}/withdraw`).send({ reason: 'Rethink' })),
    );
    expect(withdrawals.map((s) => s.status).sort()).toEqual([200, ...Array(9).fill(409)]);
  });
});

describe('attachments: quota, deletion and files without a row', () => {
  it('refuses a file past the brewery quota with 413, deletes for owners and developers (file too), never for brewers', async () => {
    const url = `/api/ingredients/${ingredientId}/attachments`;
    const first = await developer.post(url).attach('file', PDF(2000), 'one.pdf').expect(201);
    const full = await developer.post(url).attach('file', PDF(2000), 'two.pdf').expect(413);
    expect(full.body.error.code).toBe('quota_full');
    expect(full.body.error.message).toMatch(/storage is full: 0\.0 MB of 0\.0 MB|storage is full/);
    const stored = await db.Attachment.findByPk(first.body.id);
    expect(await helpers.storedKeys()).toContain(stored!.storedName);
    await brewer.delete(`/api/attachments/${first.body.id}`).send({}).expect(403);
    await developer.delete(`/api/attachments/${first.body.id}`).send({}).expect(204);
    expect(await helpers.storedKeys()).not.toContain(stored!.storedName);
    await owner.get(`/api/attachments/${first.body.id}`).expect(404);
    // Room again.
    const again = await owner.post(url).attach('file', PDF(2000), 'three.pdf').expect(201);
    const stranger = await helpers.signUpOwner(app);
    await stranger.agent.delete(`/api/attachments/${again.body.id}`).send({}).expect(404);
  });

  it('removes stored files that no row points at when the server starts, once they are over an hour old', async () => {
    const { removeOrphanUploads } =
      require('@/server/services/attachments') as typeof import('@/server/services/attachments');
    const { putObject } = require('@/server/services/object-store') as typeof import('@/server/services/object-store');
    const orphan = `${'ab'.repeat(16)}.pdf`;
    await putObject(orphan, PDF(50), 'application/pdf');
    const kept = await db.Attachment.findAll();
    expect(kept.length).toBeGreaterThan(0);
    // Just stored: it may be an upload another instance is still committing.
    expect(await removeOrphanUploads()).toBe(0);
    expect(await helpers.storedKeys()).toContain(orphan);
    const twoHoursOn = Date.now() + 2 * 60 * 60_000;
    expect(await removeOrphanUploads(twoHoursOn)).toBe(1);
    const left = await helpers.storedKeys();
    expect(left).not.toContain(orphan);
    for (const row of kept) expect(left).toContain(row.storedName);
  });
});
