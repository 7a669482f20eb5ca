import type { Express } from 'express';
import request from 'supertest';

import { Invitation, User } from '@/server/db';
import { hashToken } from '@/server/services/tokens';

import { addMember, type Agent, linkFromOutbox, signUpOwner, startApp, stopApp, uniqueEmail } from './helpers';

let app: Express;
beforeAll(async () => {
  app = await startApp();
});
afterAll(stopApp);

describe('POST /api/team/invitations', () => {
  it('stores the invitation, mails a one-time link valid 7 days, and lists it as waiting', async () => {
    const { agent } = await signUpOwner(app, { breweryName: 'Gorse Hill Brewing' });
    const email = uniqueEmail('brewer');
    const res = await agent.post('/api/team/invitations').send({ email, role: 'brewer' }).expect(201);
    expect(res.body).toMatchObject({ email, role: 'brewer', status: 'pending', invitedBy: 'Olwen Test' });
    expect(JSON.stringify(res.body)).not.toMatch(/token/i);
    const days = (new Date(res.body.expiresAt).getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const { path, token } = await linkFromOutbox(email);
    expect(path).toBe('/accept-invitation');
    const preview = await request(app).get(`/api/auth/invitations/${token}`).expect(200);
    expect(preview.body).toEqual({ email, role: 'brewer', breweryName: 'Gorse Hill Brewing', invitedBy: 'Olwen Test' });

    const team = await agent.get('/api/team').expect(200);
    expect(team.body.invitations).toHaveLength(1);
  });

  it('refuses a second open invitation to the same address and an address that already has an account', async () => {
    const { agent, email: ownerEmail } = await signUpOwner(app);
    const email = uniqueEmail();
    await agent.post('/api/team/invitations').send({ email, role: 'developer' }).expect(201);
    await agent.post('/api/team/invitations').send({ email, role: 'developer' }).expect(409);
    const taken = await agent.post('/api/team/invitations').send({ email: ownerEmail, role: 'brewer' }).expect(409);
    expect(taken.body.error.fields.email).toBeDefined();
  });

  it('validates the e-mail and the role', async () => {
    const { agent } = await signUpOwner(app);
    const res = await agent.post('/api/team/invitations').send({ email: 'nope', role: 'captain' }).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'role']);
  });
});

describe('POST /api/auth/accept-invitation', () => {
  it('creates the account with the invited role, in the inviting brewery, once', async () => {
    const owner = await signUpOwner(app);
    const email = uniqueEmail();
    await owner.agent.post('/api/team/invitations').send({ email, role: 'developer' }).expect(201);
    const { token } = await linkFromOutbox(email);
    const res = await request(app)
      .post('/api/auth/accept-invitation')
      .send({ token, name: 'Peregrine Ash', password: 'member-pass-1' })
      .expect(201);
    expect(res.body.user).toMatchObject({ email, role: 'developer', name: 'Peregrine Ash' });
    expect(res.body.organisation.id).toBe(owner.session.organisation.id);
    expect(String(res.headers['set-cookie'])).toMatch(/fw_session=/);

    const again = await request(app)
      .post('/api/auth/accept-invitation')
      .send({ token, name: 'Someone Else', password: 'member-pass-2' })
      .expect(410);
    expect(again.body.error.message).toMatch(/already been used/);
    expect(await User.count({ where: { email } })).toBe(1);
  });

  it('says so when the invitation expired or was withdrawn', async () => {
    const { agent } = await signUpOwner(app);
    const expiredEmail = uniqueEmail();
    await agent.post('/api/team/invitations').send({ email: expiredEmail, role: 'brewer' }).expect(201);
    const expired = await linkFromOutbox(expiredEmail);
    await Invitation.update(
      { expiresAt: new Date(Date.now() - 1000) },
      { where: { tokenHash: hashToken(expired.token) } },
    );
    const res = await request(app)
      .post('/api/auth/accept-invitation')
      .send({ token: expired.token, name: 'A B', password: 'member-pass-1' })
      .expect(410);
    expect(res.body.error.message).toMatch(/expired/);

    const revokedEmail = uniqueEmail();
    const created = await agent.post('/api/team/invitations').send({ email: revokedEmail, role: 'brewer' }).expect(201);
    const revoked = await linkFromOutbox(revokedEmail);
    await agent.delete(`/api/team/invitations/${created.body.id}`).send({}).expect(204);
    const gone = await request(app).get(`/api/auth/invitations/${revoked.token}`).expect(410);
    expect(gone.body.error.message).toMatch(/withdrawn/);
  });
});

describe('POST /api/team/invitations/:id/resend', () => {
  it('sends a fresh link and the old one stops working', async () => {
    const { agent } = await signUpOwner(app);
    const email = uniqueEmail();
    const created = await agent.post('/api/team/invitations').send({ email, role: 'brewer' }).expect(201);
    const first = await linkFromOutbox(email);
    await agent.post(`/api/team/invitations/${created.body.id}/resend`).send({}).expect(200);
    const second = await linkFromOutbox(email);
    expect(second.token).not.toBe(first.token);
    await request(app).get(`/api/auth/invitations/${first.token}`).expect(404);
    await request(app).get(`/api/auth/invitations/${second.token}`).expect(200);
  });
});

describe('PATCH /api/team/members/:id and deactivation', () => {
  it('changes a role, and the new role applies to the next request', async () => {
    const owner = await signUpOwner(app);
    const brewer = await addMember(app, owner.agent, 'brewer');
    await brewer.agent.get('/api/team').expect(403);
    await owner.agent.patch(`/api/team/members/${brewer.session.user.id}`).send({ role: 'owner' }).expect(200);
    await brewer.agent.get('/api/team').expect(200);
  });

  it('keeps at least one active owner', async () => {
    const owner = await signUpOwner(app);
    const res = await owner.agent
      .patch(`/api/team/members/${owner.session.user.id}`)
      .send({ role: 'brewer' })
      .expect(400);
    expect(res.body.error.message).toMatch(/at least one active owner/);
    await owner.agent.post(`/api/team/members/${owner.session.user.id}/deactivate`).send({}).expect(400);
  });

  it('deactivating a member ends their session at once and stops sign-in; reactivating lets them sign in again but not revive old sessions', async () => {
    const owner = await signUpOwner(app);
    const dev = await addMember(app, owner.agent, 'developer');
    await dev.agent.get('/api/auth/session').expect(200);
    await owner.agent.post(`/api/team/members/${dev.session.user.id}/deactivate`).send({}).expect(200);
    await dev.agent.get('/api/auth/session').expect(401);
    // A deactivated account answers a right and a wrong password alike, and like an unknown address.
    const right = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: dev.email, password: dev.password })
      .expect(401);
    const wrong = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: dev.email, password: 'not-the-password' })
      .expect(401);
    const unknown = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('nobody'), password: dev.password })
      .expect(401);
    expect(right.body).toEqual(wrong.body);
    expect(right.body).toEqual(unknown.body);
    await owner.agent.post(`/api/team/members/${dev.session.user.id}/reactivate`).send({}).expect(200);
    // The session from before the deactivation stays ended.
    await dev.agent.get('/api/auth/session').expect(401);
    await request(app).post('/api/auth/sign-in').send({ email: dev.email, password: dev.password }).expect(200);
  });
});

describe('who may call the team routes', () => {
  let owner: Awaited<ReturnType<typeof signUpOwner>>;
  let members: Record<'developer' | 'brewer', Agent>;
  let targetId: number;
  beforeAll(async () => {
    owner = await signUpOwner(app);
    members = {
      developer: (await addMember(app, owner.agent, 'developer')).agent,
      brewer: (await addMember(app, owner.agent, 'brewer')).agent,
    };
    targetId = (await addMember(app, owner.agent, 'brewer')).session.user.id;
  });

  const routes = (id: number): [string, string, object?][] => [
    ['get', '/api/team'],
    ['post', '/api/team/invitations', { email: 'x@brewery.test', role: 'brewer' }],
    ['post', '/api/team/invitations/1/resend'],
    ['delete', '/api/team/invitations/1'],
    ['patch', `/api/team/members/${id}`, { role: 'owner' }],
    ['post', `/api/team/members/${id}/deactivate`],
    ['post', `/api/team/members/${id}/reactivate`],
  ];

  it.each(['developer', 'brewer'] as const)('a %s gets 403 on every team route', async (role) => {
    for (const [method, path, payload] of routes(targetId)) {
      const call = (members[role] as unknown as Record<string, (p: string) => request.Test>)[method](path);
      const res = await (method === 'get' ? call : call.send(payload ?? {}));
      expect([method, path, res.status]).toEqual([method, path, 403]);
    }
  });

  it('a signed-out caller gets 401 on every team route', async () => {
    for (const [method, path, payload] of routes(targetId)) {
      const call = (request(app) as unknown as Record<string, (p: string) => request.Test>)[method](path);
      const res = await (method === 'get' ? call : call.send(payload ?? {}));
      expect([method, path, res.status]).toEqual([method, path, 401]);
    }
  });

  it("an owner of another brewery can neither see nor change this brewery's people", async () => {
    const stranger = await signUpOwner(app, { breweryName: 'Other Cellar' });
    const team = await stranger.agent.get('/api/team').expect(200);
    expect(team.body.members.map((m: { id: number }) => m.id)).toEqual([stranger.session.user.id]);
    await stranger.agent.patch(`/api/team/members/${targetId}`).send({ role: 'owner' }).expect(404);
    await stranger.agent.post(`/api/team/members/${targetId}/deactivate`).send({}).expect(404);
    const invitation = await owner.agent
      .post('/api/team/invitations')
      .send({ email: uniqueEmail(), role: 'brewer' })
      .expect(201);
    await stranger.agent.delete(`/api/team/invitations/${invitation.body.id}`).send({}).expect(404);
    expect((await User.findByPk(targetId))?.role).toBe('brewer');
  });
});
