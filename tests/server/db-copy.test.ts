/*
 * `npm run db:copy`: a brewery's SQLite installation (with an attached file) copied into PostgreSQL and an object
 * store, run again after changes, and refused into a database holding another brewery. Needs a PostgreSQL server:
 * runs under `npm run test:pg` (TEST_PG), skipped under `npm test`.
 */
import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';

import type { Express } from 'express';
import request from 'supertest';

import { startRemoteStore } from './helpers';

const withPostgres = process.env.TEST_PG === 'true' ? describe : describe.skip;
const ROOT = path.resolve(__dirname, '../..');
const PDF = Buffer.from('%PDF-1.4\n% a supplier spec sheet\n');

/** Loads a separate copy of the server with these environment variables (and the rest as the tests set them). */
function loadServer(env: Record<string, string | undefined>) {
  const saved = { ...process.env };
  Object.assign(process.env, env);
  for (const [key, value] of Object.entries(env)) if (value === undefined) delete process.env[key];
  let loaded!: {
    app: typeof import('@/server/app');
    db: typeof import('@/server/db');
    helpers: typeof import('./helpers');
    store: typeof import('@/server/services/object-store');
  };
  jest.isolateModules(() => {
    loaded = {
      app: require('@/server/app'),
      db: require('@/server/db'),
      helpers: require('./helpers'),
      store: require('@/server/services/object-store'),
    };
  });
  process.env = saved;
  return loaded;
}

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-copy-'));
const sourceEnv = {
  DATABASE_URL: undefined,
  DATABASE_PATH: path.join(work, 'brewery.sqlite'),
  UPLOADS_DIR: path.join(work, 'uploads'),
};
let remote: Awaited<ReturnType<typeof startRemoteStore>> | undefined;

beforeAll(async () => {
  if (process.env.TEST_PG !== 'true') return;
  remote = await startRemoteStore('hosted-files');
});
afterAll(async () => {
  await remote?.close();
  fs.rmSync(work, { recursive: true, force: true });
});

/** Runs `npm run db:copy`'s script as a brewery would, from the SQLite installation to `to`. */
async function dbCopy(to: string): Promise<{ code: number; out: string }> {
  try {
    const { stdout } = await promisify(execFile)(
      process.execPath,
      ['--import', 'tsx', 'server/cli/db-copy.ts', '--to', to],
      {
        cwd: ROOT,
        env: {
          ...process.env,
          ...sourceEnv,
          DATABASE_URL: '',
          JWT_SECRET: '',
          S3_BUCKET: 'hosted-files',
          S3_ENDPOINT: remote!.endpoint,
          S3_FORCE_PATH_STYLE: 'true',
          AWS_ACCESS_KEY_ID: 'S3RVER',
          AWS_SECRET_ACCESS_KEY: 'S3RVER',
          LOG_LEVEL: 'silent',
        },
      },
    );
    return { code: 0, out: stdout };
  } catch (error) {
    const failed = error as { code: number; stdout: string; stderr: string };
    return { code: failed.code, out: `${failed.stdout}${failed.stderr}` };
  }
}

withPostgres('npm run db:copy', () => {
  it('copies every table and file, counts them on both sides, brings the copy up to date when run again, and the copy serves the brewery', async () => {
    // The brewery on its own machine: SQLite and the local store.
    const source = loadServer(sourceEnv);
    await source.db.prepareDatabase();
    const sourceApp: Express = source.app.createApp();
    const owner = await source.helpers.signUpOwner(sourceApp, { breweryName: 'Copied Ferments' });
    await source.helpers.addMember(sourceApp, owner.agent, 'brewer');
    const ingredient = await owner.agent
      .post('/api/ingredients')
      .send({
        name: 'Hibiscus syrup',
        category: 'sugar-syrup',
        servingSize: 100,
        sugarsG: 60,
        fermentableSharePct: 100,
        steepSharePct: 100,
      })
      .expect(201);
    const file = await owner.agent
      .post(`/api/ingredients/${ingredient.body.id}/attachments`)
      .attach('file', PDF, 'spec.pdf')
      .expect(201);
    // A licence declaration points the brewery at its owner: a foreign key one way round the other.
    await owner.agent
      .patch('/api/organisation')
      .send({ name: 'Copied Ferments', abvLimitPercent: 0.5, licensedForAlcohol: true })
      .expect(200);

    const first = await dbCopy(process.env.DATABASE_URL!);
    expect(first.out).toMatch(/every table counts the same on both sides/);
    expect(first.out).toMatch(/Files: 1 copied, 0 already in hosted-files/);
    expect(first.code).toBe(0);
    expect(first.out).not.toContain(`:${new URL(process.env.DATABASE_URL!).password}@`);

    // The hosted instance on the copy: PostgreSQL and the bucket.
    const hosted = loadServer({
      S3_BUCKET: 'hosted-files',
      S3_ENDPOINT: remote!.endpoint,
      S3_FORCE_PATH_STYLE: 'true',
    });
    // The SDK reads its credentials when it first sends, from the environment.
    process.env.AWS_ACCESS_KEY_ID = 'S3RVER';
    process.env.AWS_SECRET_ACCESS_KEY = 'S3RVER';
    const hostedApp: Express = hosted.app.createApp();
    const signedIn = request.agent(hostedApp);
    await signedIn.post('/api/auth/sign-in').send({ email: owner.email, password: owner.password }).expect(200);
    const list = await signedIn.get(`/api/ingredients/${ingredient.body.id}/attachments`).expect(200);
    expect(list.body.map((a: { name: string }) => a.name)).toEqual(['spec.pdf']);
    const download = await signedIn.get(file.body.url).buffer(true).parse(source.helpers.asBuffer).expect(200);
    expect(Buffer.compare(download.body as Buffer, PDF)).toBe(0);
    // New rows on the copy take ids after the copied ones.
    const made = await signedIn
      .post('/api/ingredients')
      .send({
        name: 'Rose syrup',
        category: 'sugar-syrup',
        servingSize: 100,
        sugarsG: 55,
        fermentableSharePct: 100,
        steepSharePct: 100,
      })
      .expect(201);
    expect(made.body.id).toBeGreaterThan(ingredient.body.id);
    await signedIn.delete(`/api/attachments/${file.body.id}`).send({}).expect(204);

    // Changes on the source since, then the copy again: it follows the source, the file is put back.
    await owner.agent.post(`/api/ingredients/${ingredient.body.id}/archive`).send({}).expect(200);
    const again = await dbCopy(process.env.DATABASE_URL!);
    expect(again.code).toBe(0);
    expect(again.out).toMatch(/Files: 1 copied/);
    const archived = await hosted.db.Ingredient.findByPk(ingredient.body.id);
    expect(archived!.archivedAt).not.toBeNull();
    expect(await hosted.db.Ingredient.findByPk(made.body.id)).toBeNull();
    expect(await remote!.keys()).toEqual([(await source.db.Attachment.findByPk(file.body.id))!.storedName]);

    // Another installation's SQLite file may not be poured into this database.
    await hosted.db.Organisation.create({ name: 'Someone Else Brewing' });
    const refused = await dbCopy(process.env.DATABASE_URL!);
    expect(refused.code).toBe(1);
    expect(refused.out).toMatch(/already holds 1 other brewery \("Someone Else Brewing"\)/);

    delete process.env.AWS_ACCESS_KEY_ID;
    delete process.env.AWS_SECRET_ACCESS_KEY;
    await hosted.store.closeObjectStore();
    await hosted.db.sequelize.close();
    await source.store.closeObjectStore();
    await source.db.sequelize.close();
  }, 120_000);
});
