import type { Express } from 'express';
import request from 'supertest';

import { addMember, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
beforeAll(async () => {
  app = await startApp();
});
afterAll(stopApp);

describe('PATCH /api/profile', () => {
  it('renames the signed-in person and validates the name', async () => {
    const { agent } = await signUpOwner(app);
    const res = await agent.patch('/api/profile').send({ name: '  Nell Brightwater ' }).expect(200);
    expect(res.body.user.name).toBe('Nell Brightwater');
    const bad = await agent.patch('/api/profile').send({ name: '' }).expect(400);
    expect(bad.body.error.fields.name).toBeDefined();
    await request(app).patch('/api/profile').send({ name: 'Nobody' }).expect(401);
  });
});

describe('POST /api/profile/password', () => {
  it('needs the current password, keeps this session and ends the others', async () => {
    const { agent, email, password } = await signUpOwner(app);
    const other = request.agent(app);
    await other.post('/api/auth/sign-in').send({ email, password }).expect(200);

    const wrong = await agent
      .post('/api/profile/password')
      .send({ currentPassword: 'wrong-one-1', newPassword: 'new-password-1' })
      .expect(400);
    expect(wrong.body.error.fields.currentPassword).toBeDefined();
    const same = await agent
      .post('/api/profile/password')
      .send({ currentPassword: password, newPassword: password })
      .expect(400);
    expect(same.body.error.fields.newPassword).toMatch(/different/);

    await agent
      .post('/api/profile/password')
      .send({ currentPassword: password, newPassword: 'new-password-1' })
      .expect(200);
    await agent.get('/api/auth/session').expect(200);
    await other.get('/api/auth/session').expect(401);
  });
});

describe('GET /api/outbox (outbox closed, as in production without SMTP)', () => {
  it('shows an owner their brewery invitations but not other people’s reset links, and nothing of other breweries', async () => {
    const owner = await signUpOwner(app);
    const brewer = await addMember(app, owner.agent, 'brewer');
    await request(app).post('/api/auth/forgot-password').send({ email: brewer.email }).expect(202);
    const stranger = await signUpOwner(app);
    await stranger.agent
      .post('/api/team/invitations')
      .send({ email: 'someone@elsewhere.test', role: 'brewer' })
      .expect(201);

    const seenByOwner = await owner.agent.get('/api/outbox').expect(200);
    expect(seenByOwner.body.open).toBe(false);
    const kinds = seenByOwner.body.messages.map((m: { kind: string; to: string }) => `${m.kind}:${m.to}`);
    expect(kinds).toEqual([`invitation:${brewer.email}`]);

    const seenByBrewer = await brewer.agent.get('/api/outbox').expect(200);
    expect(seenByBrewer.body.messages.map((m: { kind: string }) => m.kind)).toEqual(['password-reset']);
    await request(app).get('/api/outbox').expect(401);

    const foreignId = (await stranger.agent.get('/api/outbox').expect(200)).body.messages[0].id;
    await owner.agent.get(`/api/outbox/${foreignId}`).expect(404);
  });
});
