import type { Express } from 'express';
import jwt from 'jsonwebtoken';
import request from 'supertest';

import { Organisation, OutboxMessage, PasswordReset, User } from '@/server/db';
import { sessionSigningKey } from '@/server/services/sessions';
import { hashToken } from '@/server/services/tokens';

import { linkFromOutbox, signUpOwner, startApp, stopApp, uniqueEmail } from './helpers';

let app: Express;
beforeAll(async () => {
  app = await startApp();
});
afterAll(stopApp);

const body = (overrides: Record<string, unknown> = {}) => ({
  breweryName: 'Larkspur Ferments',
  name: 'Tamsin Vale',
  email: uniqueEmail(),
  password: 'long-enough-1',
  ...overrides,
});

describe('POST /api/auth/sign-up', () => {
  it('creates nothing until the e-mailed link is followed; the link then creates the brewery and its owner and signs them in', async () => {
    const input = body();
    const breweries = await Organisation.count();
    const started = await request(app).post('/api/auth/sign-up').send(input).expect(202);
    expect(started.headers['set-cookie']).toBeUndefined();
    expect(await Organisation.count()).toBe(breweries);
    expect(await User.count({ where: { email: input.email } })).toBe(0);

    const { path, token } = await linkFromOutbox(input.email);
    expect(path).toBe('/confirm-sign-up');
    const res = await request(app).post('/api/auth/confirm-sign-up').send({ token }).expect(201);
    expect(res.body).toEqual({
      user: {
        id: expect.any(Number),
        name: 'Tamsin Vale',
        email: input.email,
        role: 'owner',
        unitSystem: 'metric',
        notifyReviews: true,
      },
      organisation: {
        id: expect.any(Number),
        name: 'Larkspur Ferments',
        abvLimitPercent: 0.5,
        currency: 'USD',
        warmestTempC: 35,
        ratingSharePercent: 80,
        lotPrefix: 'LOT',
        licensedForAlcohol: false,
      },
    });
    expect(JSON.stringify(res.body)).not.toMatch(/hash|password/i);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/fw_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).toMatch(/Max-Age=43200/);

    const user = await User.findOne({ where: { email: input.email } });
    expect(user?.role).toBe('owner');
    expect(user?.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(user?.passwordHash).not.toContain(input.password);
    expect((await Organisation.findByPk(user!.organisationId))?.name).toBe('Larkspur Ferments');
    // The link works once.
    await request(app).post('/api/auth/confirm-sign-up').send({ token }).expect(410);
  });

  it('answers a sign-up with an address that has an account exactly like any other, e-mails that address instead, and creates nothing', async () => {
    const taken = body();
    await signUpOwner(app, { email: taken.email });
    const breweries = await Organisation.count();
    const fresh = await request(app).post('/api/auth/sign-up').send(body()).expect(202);
    const again = await request(app)
      .post('/api/auth/sign-up')
      .send({ ...taken, email: taken.email.toUpperCase() })
      .expect(202);
    expect(again.body).toEqual(fresh.body);
    expect(again.headers['set-cookie']).toBeUndefined();
    const told = await OutboxMessage.findOne({ where: { to: taken.email }, order: [['id', 'DESC']] });
    expect(told?.subject).toBe('Someone tried to sign up with your address');
    expect(told?.text).not.toMatch(/token=/);
    expect(await Organisation.count()).toBe(breweries);
  });

  it('lists every bad field at once', async () => {
    const res = await request(app)
      .post('/api/auth/sign-up')
      .send({ breweryName: 'X', email: 'not-an-email', password: 'short' })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['breweryName', 'email', 'name', 'password']);
    expect(res.body.error.fields.password).toMatch(/at least 8/);
  });

  it('answers 400, never 500, for a missing, malformed or non-object body', async () => {
    await request(app).post('/api/auth/sign-up').send({}).expect(400);
    const malformed = await request(app)
      .post('/api/auth/sign-up')
      .set('Content-Type', 'application/json')
      .send('{"email":')
      .expect(400);
    expect(malformed.body.error.code).toBe('invalid_json');
    const array = await request(app).post('/api/auth/sign-up').send([1, 2]).expect(400);
    expect(array.body.error.message).toMatch(/JSON object/);
  });

  it('refuses a body that is not JSON (415)', async () => {
    await request(app).post('/api/auth/sign-up').type('form').send('email=a@b.c').expect(415);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password and gives the same answer for a wrong password or an unknown e-mail', async () => {
    const { email, password } = await signUpOwner(app);
    const ok = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: ` ${email.toUpperCase()} `, password })
      .expect(200);
    expect(ok.body.user.email).toBe(email);
    const wrong = await request(app)
      .post('/api/auth/sign-in')
      .send({ email, password: 'not-the-password' })
      .expect(401);
    const unknown = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail(), password: 'not-the-password' })
      .expect(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });
});

describe('GET /api/auth/session', () => {
  it('answers 401 without a session and the session with one', async () => {
    await request(app).get('/api/auth/session').expect(401);
    const { agent, session } = await signUpOwner(app);
    const res = await agent.get('/api/auth/session').expect(200);
    expect(res.body).toEqual(session);
  });

  it('refuses an expired token, a token signed with another secret, and a token with another algorithm', async () => {
    const { session } = await signUpOwner(app);
    const sub = String(session.user.id);
    const expired = jwt.sign(
      { sub, tv: 0, jti: 'expired-one', exp: Math.floor(Date.now() / 1000) - 10 },
      sessionSigningKey(),
      { algorithm: 'HS256' },
    );
    const forged = jwt.sign({ sub, tv: 0 }, 'another-secret-entirely', { algorithm: 'HS256' });
    const unsigned = jwt.sign({ sub, tv: 0 }, '', { algorithm: 'none' });
    for (const token of [expired, forged, unsigned]) {
      await request(app).get('/api/auth/session').set('Cookie', `fw_session=${token}`).expect(401);
    }
  });
});

describe('POST /api/auth/sign-out', () => {
  it('clears the cookie', async () => {
    const { agent } = await signUpOwner(app);
    const res = await agent.post('/api/auth/sign-out').send({}).expect(204);
    expect(String(res.headers['set-cookie'])).toMatch(/fw_session=;/);
    await agent.get('/api/auth/session').expect(401);
  });
});

describe('POST /api/auth/forgot-password and /reset-password', () => {
  it('answers the same whether or not the address has an account', async () => {
    const { email } = await signUpOwner(app);
    const known = await request(app).post('/api/auth/forgot-password').send({ email }).expect(202);
    const unknownEmail = uniqueEmail();
    const unknown = await request(app).post('/api/auth/forgot-password').send({ email: unknownEmail }).expect(202);
    expect(known.body).toEqual(unknown.body);
    expect(await OutboxMessage.count({ where: { to: unknownEmail } })).toBe(0);
    expect(await OutboxMessage.count({ where: { to: email, kind: 'password-reset' } })).toBe(1);
  });

  it('resets the password once, ends older sessions, and stores only a hash of the token', async () => {
    const { agent: oldSession, email } = await signUpOwner(app);
    await request(app).post('/api/auth/forgot-password').send({ email }).expect(202);
    const { path, token } = await linkFromOutbox(email);
    expect(path).toBe('/reset-password');
    expect(await PasswordReset.count({ where: { tokenHash: token } })).toBe(0);
    expect(await PasswordReset.count({ where: { tokenHash: hashToken(token) } })).toBe(1);

    const fresh = request.agent(app);
    await fresh.post('/api/auth/reset-password').send({ token, password: 'brand-new-pass' }).expect(200);
    await fresh.get('/api/auth/session').expect(200);
    await oldSession.get('/api/auth/session').expect(401);
    await request(app).post('/api/auth/sign-in').send({ email, password: 'brand-new-pass' }).expect(200);

    const reused = await request(app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'another-pass-9' })
      .expect(410);
    expect(reused.body.error.message).toMatch(/already been used/);
  });

  it('says so when the link has expired (after 1 hour) and changes nothing', async () => {
    const { email, password } = await signUpOwner(app);
    await request(app).post('/api/auth/forgot-password').send({ email }).expect(202);
    const { token } = await linkFromOutbox(email);
    const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(token) } });
    expect(reset!.expiresAt.getTime() - reset!.createdAt.getTime()).toBeCloseTo(60 * 60 * 1000, -3);
    await reset!.update({ expiresAt: new Date(Date.now() - 1000) });
    const res = await request(app)
      .post('/api/auth/reset-password')
      .send({ token, password: 'brand-new-pass' })
      .expect(410);
    expect(res.body.error.message).toMatch(/expired/);
    await request(app).post('/api/auth/sign-in').send({ email, password }).expect(200);
  });

  it('refuses an unknown token', async () => {
    await request(app)
      .post('/api/auth/reset-password')
      .send({ token: 'x'.repeat(43), password: 'brand-new-pass' })
      .expect(404);
  });
});
