import type { Express } from 'express';
import request from 'supertest';

let app: Express;
let helpers: typeof import('./helpers');

beforeAll(async () => {
  // Proxy headers trusted here, so each request can come from its own client address.
  process.env.AUTH_ACCOUNT_RATE_LIMIT = '3';
  process.env.TRUST_PROXY = 'true';
  helpers = require('./helpers');
  app = await helpers.startApp();
});
afterAll(() => helpers.stopApp());

let address = 0;
const from = () => `198.51.100.${++address}`; // RFC 5737 documentation range

describe('per-account rate limits', () => {
  it('stop a fourth wrong password for one account even when every attempt comes from another address', async () => {
    const { email } = await helpers.signUpOwner(app);
    for (let i = 0; i < 3; i++) {
      await request(app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', from())
        .send({ email, password: 'wrong-password' })
        .expect(401);
    }
    const res = await request(app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', from())
      .send({ email, password: 'wrong-password' })
      .expect(429);
    expect(res.body.error.code).toBe('too_many_requests');
    // Another account is not affected.
    await request(app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', from())
      .send({ email: helpers.uniqueEmail(), password: 'wrong-password' })
      .expect(401);
  });

  it('hold on forgot-password, reset links, invitation links and password changes', async () => {
    const { agent, email } = await helpers.signUpOwner(app);
    for (let i = 0; i < 3; i++)
      await request(app).post('/api/auth/forgot-password').set('X-Forwarded-For', from()).send({ email }).expect(202);
    await request(app).post('/api/auth/forgot-password').set('X-Forwarded-For', from()).send({ email }).expect(429);

    const token = 'a'.repeat(43);
    for (let i = 0; i < 3; i++)
      await request(app)
        .post('/api/auth/reset-password')
        .set('X-Forwarded-For', from())
        .send({ token, password: 'new-pass-123' })
        .expect(404);
    await request(app)
      .post('/api/auth/reset-password')
      .set('X-Forwarded-For', from())
      .send({ token, password: 'new-pass-123' })
      .expect(429);
    for (let i = 0; i < 3; i++)
      await request(app)
        .post('/api/auth/accept-invitation')
        .set('X-Forwarded-For', from())
        .send({ token, name: 'X', password: 'new-pass-123' })
        .expect(404);
    await request(app)
      .post('/api/auth/accept-invitation')
      .set('X-Forwarded-For', from())
      .send({ token, name: 'X', password: 'new-pass-123' })
      .expect(429);

    for (let i = 0; i < 3; i++)
      await agent
        .post('/api/profile/password')
        .set('X-Forwarded-For', from())
        .send({ currentPassword: 'not-it-at-all', newPassword: 'new-pass-123' })
        .expect(400);
    await agent
      .post('/api/profile/password')
      .set('X-Forwarded-For', from())
      .send({ currentPassword: 'not-it-at-all', newPassword: 'new-pass-123' })
      .expect(429);
  });

  it('do not count successful sign-ins', async () => {
    const { email, password } = await helpers.signUpOwner(app);
    for (let i = 0; i < 5; i++)
      await request(app).post('/api/auth/sign-in').set('X-Forwarded-For', from()).send({ email, password }).expect(200);
  });
});
