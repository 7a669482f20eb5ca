import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

import type { Express } from 'express';
import jwt from 'jsonwebtoken';
import request from 'supertest';

import { redactUrl } from '@/server/app';
import { config } from '@/server/config';
import { Invitation, OutboxMessage, PasswordReset, RevokedSession, User } from '@/server/db';
import { redactExpiredLinks } from '@/server/services/outbox';

import { addMember, linkFromOutbox, signUpOwner, startApp, stopApp, uniqueEmail } from './helpers';

let app: Express;
beforeAll(async () => {
  app = await startApp();
});
afterAll(stopApp);

const ROOT = path.resolve(__dirname, '../..');

/** Every quoted string of 8 characters or more in the repository's own tracked text files. */
function stringsInRepository(): string[] {
  const files = execFileSync(
    'git',
    ['ls-files', 'app', 'components', 'lib', 'server', 'tests', '*.md', '.env.example', 'app.json', 'package.json'],
    { cwd: ROOT, encoding: 'utf8' },
  )
    .split('\n')
    .filter((f) => (f && !f.endsWith('.json')) || f === 'app.json' || f === 'package.json')
    .filter((f) => f && fs.existsSync(path.join(ROOT, f)) && fs.statSync(path.join(ROOT, f)).size < 400_000);
  const found = new Set<string>();
  for (const file of files) {
    const text = fs.readFileSync(path.join(ROOT, file), 'utf8');
    for (const match of text.matchAll(/(["'`])([^"'`\n]{8,200})\1/g)) found.add(match[2]);
    for (const match of text.matchAll(/=\s*([^\s#]{8,200})$/gm)) found.add(match[1]);
  }
  return [...found];
}

describe('the session secret', () => {
  // One machine (SQLite) only: with DATABASE_URL the secret must come from the environment (config.test.ts).
  const onOneMachine = process.env.DATABASE_URL ? it.skip : it;
  onOneMachine(
    'is generated at first start beside the database, mode 0600, and no string in the repository signs a valid token',
    async () => {
      expect(config.jwtSecret).toBeNull();
      const stat = fs.statSync(config.sessionSecretFile);
      expect(stat.mode & 0o777).toBe(0o600);
      expect(fs.readFileSync(config.sessionSecretFile, 'utf8').trim()).toMatch(/^[0-9a-f]{64}$/);

      const { agent, session } = await signUpOwner(app);
      await agent.get('/api/auth/session').expect(200);
      const candidates = stringsInRepository();
      expect(candidates.length).toBeGreaterThan(1000);
      const claims = { sub: String(session.user.id), tv: 0, jti: 'forged-session' };
      const accepted: string[] = [];
      for (const secret of candidates) {
        const token = jwt.sign(claims, secret, { algorithm: 'HS256', expiresIn: 600 });
        const res = await request(app).get('/api/auth/session').set('Cookie', `fw_session=${token}`);
        if (res.status !== 401) accepted.push(secret);
      }
      expect(accepted).toEqual([]);
    },
    120_000,
  );
});

describe('GET /api/outbox (closed, as under npm start)', () => {
  it('is for signed-in people only, each their own mail; owners also the brewery invitations and reviews, never another reset or another brewery', async () => {
    const owner = await signUpOwner(app);
    const brewer = await addMember(app, owner.agent, 'brewer');
    const invitee = uniqueEmail('invitee');
    await owner.agent.post('/api/team/invitations').send({ email: invitee, role: 'developer' }).expect(201);
    await request(app).post('/api/auth/forgot-password').send({ email: brewer.email }).expect(202);
    await request(app)
      .post('/api/auth/sign-up')
      .send({ breweryName: 'Copycat', name: 'Someone', email: brewer.email, password: 'whatever-123' })
      .expect(202);
    const stranger = await signUpOwner(app);

    await request(app).get('/api/outbox').expect(401);
    const kinds = async (agent: typeof owner.agent) =>
      ((await agent.get('/api/outbox').expect(200)).body.messages as { to: string; kind: string }[])
        .map((m) => `${m.kind}:${m.to}`)
        .sort();
    expect(await kinds(brewer.agent)).toEqual(
      [`password-reset:${brewer.email}`, `sign-up-attempt:${brewer.email}`].sort(),
    );
    const ownerSees = await kinds(owner.agent);
    expect(ownerSees).toContain(`invitation:${invitee}`);
    expect(ownerSees).toContain(`invitation:${brewer.email}`);
    expect(ownerSees.filter((k) => k.includes(brewer.email) && !k.startsWith('invitation'))).toEqual([]);
    expect(
      (await stranger.agent.get('/api/outbox').expect(200)).body.messages.every(
        (m: { to: string }) => m.to === stranger.email,
      ),
    ).toBe(true);

    const reset = await OutboxMessage.findOne({ where: { to: brewer.email, kind: 'password-reset' } });
    await owner.agent.get(`/api/outbox/${reset!.id}`).expect(404);
    await brewer.agent.get(`/api/outbox/${reset!.id}`).expect(200);
  });
});

describe('one-time links', () => {
  it('are redacted from the stored message once used, and once expired', async () => {
    const owner = await signUpOwner(app);
    const member = await addMember(app, owner.agent, 'brewer');
    await request(app).post('/api/auth/forgot-password').send({ email: member.email }).expect(202);
    const { token } = await linkFromOutbox(member.email);
    await request(app).post('/api/auth/reset-password').send({ token, password: 'new-password-1' }).expect(200);
    const used = await OutboxMessage.findOne({ where: { to: member.email, kind: 'password-reset' } });
    expect(used!.text).not.toContain(token);
    expect(used!.text).toMatch(/used or has expired/);
    // The confirmation and invitation links were used too.
    for (const message of await OutboxMessage.findAll({ where: { to: [owner.email, member.email] } }))
      expect(message.text).not.toMatch(/token=/);

    await request(app).post('/api/auth/forgot-password').send({ email: member.email }).expect(202);
    const fresh = await OutboxMessage.findOne({
      where: { to: member.email, kind: 'password-reset' },
      order: [['id', 'DESC']],
    });
    expect(fresh!.text).toMatch(/token=/);
    await redactExpiredLinks(new Date(Date.now() + 2 * 3600_000));
    await fresh!.reload();
    expect(fresh!.text).not.toMatch(/token=/);
  });

  it('never reach the logs: tokens in queries and invitation paths are hidden', () => {
    expect(redactUrl('/api/auth/invitations/abcdefghijklmnopqrstuvwxyz')).toBe('/api/auth/invitations/[hidden]');
    expect(redactUrl('/reset-password?token=abc123&x=1')).toBe('/reset-password?token=[hidden]&x=1');
    expect(redactUrl('/api/team/invitations/12/resend')).toBe('/api/team/invitations/12/resend');
  });
});

describe('npm run reset-link', () => {
  it('prints a one-time reset link for an account, and a confirmation link for a waiting sign-up', async () => {
    const owner = await signUpOwner(app);
    const waiting = uniqueEmail('waiting');
    await request(app)
      .post('/api/auth/sign-up')
      .send({ breweryName: 'Hollow Oak', name: 'Wren', email: waiting, password: 'waiting-pass-1' })
      .expect(202);
    const run = (email: string) =>
      execFileSync(process.execPath, ['--import', 'tsx', 'server/cli/reset-link.ts', email], {
        cwd: ROOT,
        env: { ...process.env, LOG_LEVEL: 'silent' },
        encoding: 'utf8',
      });
    const printed = run(owner.email);
    const resetToken = /reset-password\?token=(\S+)/.exec(printed)![1];
    expect(await PasswordReset.count({ where: {} })).toBeGreaterThan(0);
    await request(app)
      .post('/api/auth/reset-password')
      .send({ token: decodeURIComponent(resetToken), password: 'from-the-console-1' })
      .expect(200);
    const confirm = /confirm-sign-up\?token=(\S+)/.exec(run(waiting))![1];
    await request(app)
      .post('/api/auth/confirm-sign-up')
      .send({ token: decodeURIComponent(confirm) })
      .expect(201);
    expect(() => run(uniqueEmail('nobody'))).toThrow();
  }, 60_000);

  it('is offered by the server facts the forgot-password screen reads', async () => {
    const res = await request(app).get('/api/health').expect(200);
    expect(res.body).toMatchObject({ outbox: true, outboxOpen: false });
  });
});

describe('POST /api/auth/sign-out', () => {
  it('ends the token on the server: a kept copy of the cookie no longer works', async () => {
    const { agent } = await signUpOwner(app);
    const session = await agent.get('/api/auth/session').expect(200);
    const cookie = String(session.request.cookies ?? '');
    const copy =
      cookie ||
      (
        await agent.jar.getCookie('fw_session', { path: '/', domain: '127.0.0.1', secure: false, script: false })
      )?.toString();
    expect(copy).toMatch(/fw_session=/);
    await agent.post('/api/auth/sign-out').send({}).expect(204);
    await request(app).get('/api/auth/session').set('Cookie', copy!).expect(401);
    expect(await RevokedSession.count()).toBeGreaterThan(0);
  });
});

describe('no enumeration', () => {
  it('invites an address that has an account in another brewery exactly like any other', async () => {
    const elsewhere = await signUpOwner(app);
    const owner = await signUpOwner(app);
    const fresh = await owner.agent
      .post('/api/team/invitations')
      .send({ email: uniqueEmail('new'), role: 'brewer' })
      .expect(201);
    const taken = await owner.agent
      .post('/api/team/invitations')
      .send({ email: elsewhere.email, role: 'brewer' })
      .expect(201);
    expect(Object.keys(taken.body).sort()).toEqual(Object.keys(fresh.body).sort());
    expect(taken.body.status).toBe(fresh.body.status);
    // Following the link tells the holder of the address, and only them, to sign in instead.
    const { token } = await linkFromOutbox(elsewhere.email);
    await request(app)
      .post('/api/auth/accept-invitation')
      .send({ token, name: 'Twice', password: 'twice-pass-1' })
      .expect(409);
  });
});

describe('many at once', () => {
  it('ten identical invitations at once make one open invitation; the rest get 409', async () => {
    const owner = await signUpOwner(app);
    const email = uniqueEmail('crowd');
    const answers = await Promise.all(
      Array.from({ length: 10 }, () => owner.agent.post('/api/team/invitations').send({ email, role: 'brewer' })),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([201, ...Array(9).fill(409)]);
    expect(await Invitation.count({ where: { email, acceptedAt: null, revokedAt: null } })).toBe(1);
  });

  it('reactivating does not revive tokens from before; deactivating raises the token version', async () => {
    const owner = await signUpOwner(app);
    const member = await addMember(app, owner.agent, 'developer');
    const before = await User.findByPk(member.session.user.id);
    await owner.agent.post(`/api/team/members/${member.session.user.id}/deactivate`).send({}).expect(200);
    const after = await User.findByPk(member.session.user.id);
    expect(after!.tokenVersion).toBe(before!.tokenVersion + 1);
  });
});
