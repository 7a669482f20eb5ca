import type { Express } from 'express';
import request from 'supertest';

let app: Express;
let helpers: typeof import('./helpers');

beforeAll(async () => {
  process.env.AUTH_RATE_LIMIT = '3';
  helpers = require('./helpers');
  app = await helpers.startApp();
});
afterAll(() => helpers.stopApp());

describe('auth rate limit', () => {
  it('answers 429 in the uniform error shape once the per-minute limit is spent', async () => {
    for (let i = 0; i < 3; i++) {
      await request(app)
        .post('/api/auth/sign-in')
        .send({ email: 'x@brewery.test', password: 'whatever-1' })
        .expect(401);
    }
    const res = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: 'x@brewery.test', password: 'whatever-1' })
      .expect(429);
    expect(res.body.error.code).toBe('too_many_requests');
    expect(res.headers.ratelimit).toBeDefined();
  });

  it('ignores X-Forwarded-For unless TRUST_PROXY is set, so a client cannot pick a fresh address per attempt', async () => {
    for (let i = 0; i < 2; i++) {
      const res = await request(app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', `203.0.113.${i + 1}`)
        .send({ email: 'y@brewery.test', password: 'whatever-1' });
      expect(res.status).toBe(429);
    }
  });
});
