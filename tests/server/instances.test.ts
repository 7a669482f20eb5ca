/*
 * Several instances sharing one PostgreSQL database, as behind a proxy: run by `npm run test:pg` (skipped under
 * `npm test`, where one SQLite file has one instance). The second instance is a second copy of the whole server
 * (its own modules, Sequelize pool, caches and limiters) loaded in this process by jest.isolateModules.
 */
import type { Express } from 'express';
import request from 'supertest';

const shared = process.env.DATABASE_URL ? describe : describe.skip;

let helpers: typeof import('./helpers');
let first: Express;
let second: Express;
let secondDb: typeof import('@/server/db');
let secondStore: typeof import('@/server/services/object-store');

beforeAll(async () => {
  if (!process.env.DATABASE_URL) return;
  process.env.AUTH_ACCOUNT_RATE_LIMIT = '3';
  process.env.UPLOAD_QUOTA_MB = String(3 / 1024);
  process.env.CACHE_TTL_MS = '300';
  helpers = require('./helpers');
  first = await helpers.startApp();
  jest.isolateModules(() => {
    secondDb = require('@/server/db');
    secondStore = require('@/server/services/object-store');
    second = (require('@/server/app') as typeof import('@/server/app')).createApp();
  });
});
afterAll(async () => {
  if (!process.env.DATABASE_URL) return;
  await helpers.stopApp();
  await secondStore.closeObjectStore();
  await secondDb.sequelize.close();
});

const signInOn = async (app: Express, email: string, password: string) => {
  const agent = request.agent(app);
  await agent.post('/api/auth/sign-in').send({ email, password }).expect(200);
  return agent;
};

shared('instances sharing PostgreSQL', () => {
  it('see a deactivation made on the other within CACHE_TTL_MS', async () => {
    const owner = await helpers.signUpOwner(first);
    const member = await helpers.addMember(first, owner.agent, 'brewer');
    const session = member.agent.get('/api/auth/session');
    await session.expect(200);
    // The brewer's cookie, sent to the second instance.
    const cookie = (await member.agent.get('/api/auth/session')).request.cookies as unknown as string;
    await request(second).get('/api/auth/session').set('Cookie', cookie).expect(200);
    await owner.agent.post(`/api/team/members/${member.session.user.id}/deactivate`).send({}).expect(200);
    await new Promise((resolve) => setTimeout(resolve, 400));
    await request(second).get('/api/auth/session').set('Cookie', cookie).expect(401);
  });

  it('take write transactions one at a time across instances: ten uploads at once, split between them, fill the quota once', async () => {
    const owner = await helpers.signUpOwner(first);
    const ownerOnSecond = await signInOn(second, owner.email, owner.password);
    const ingredient = await owner.agent
      .post('/api/ingredients')
      .send({
        name: 'Shared syrup',
        category: 'puree',
        servingSize: 100,
        sugarsG: 60,
        fermentableSharePct: 100,
        steepSharePct: 100,
      })
      .expect(201);
    // The quota is 3 KB (set above): one 2 KB file fits, a second does not.
    const pdf = Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(2000 - 9, 0x20)]);
    const uploads = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        (i % 2 ? ownerOnSecond : owner.agent)
          .post(`/api/ingredients/${ingredient.body.id}/attachments`)
          .attach('file', pdf, `sheet-${i}.pdf`),
      ),
    );
    expect(uploads.map((r) => r.status).sort()).toEqual([201, ...Array(9).fill(413)]);
    const kept = await secondDb.Attachment.findAll({ where: { ingredientId: ingredient.body.id } });
    expect(kept).toHaveLength(1);
    // The nine refused files were taken out of the store again (both instances' local stores share the folder).
    expect(await helpers.storedKeys()).toEqual([kept[0].storedName]);
  });

  it('count an attempt at any account name, however long, without a 5xx', async () => {
    const res = await request(second)
      .post('/api/auth/sign-in')
      .send({ email: `${'x'.repeat(5000)}@brewery.test`, password: 'whatever-1' });
    expect(res.status).toBe(400);
    // The form's own answer about the field (the limit counted the attempt first, under a hash of the name).
    expect(res.body.error.fields.email).toEqual(expect.any(String));
  });

  it('count one sign-in limit together: failed attempts at an account spent on one are refused on the other', async () => {
    for (let i = 0; i < 3; i++) {
      await request(i % 2 ? second : first)
        .post('/api/auth/sign-in')
        .send({ email: 'nobody@brewery.test', password: 'whatever-1' })
        .expect(401);
    }
    const res = await request(second)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@brewery.test', password: 'whatever-1' })
      .expect(429);
    expect(res.body.error.code).toBe('too_many_requests');
  });
});
