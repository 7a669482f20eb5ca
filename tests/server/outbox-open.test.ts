import type { Express } from 'express';
import request from 'supertest';

let app: Express;
let helpers: typeof import('./helpers');

beforeAll(async () => {
  // Development mode: the outbox is open to anyone, as a local mail catcher is.
  process.env.OUTBOX_OPEN = 'true';
  helpers = require('./helpers');
  app = await helpers.startApp();
});
afterAll(() => helpers.stopApp());

describe('GET /api/outbox (open, development)', () => {
  it('lets a signed-out person read a reset link and follow it', async () => {
    const { email } = await helpers.signUpOwner(app);
    await request(app).post('/api/auth/forgot-password').send({ email }).expect(202);
    const res = await request(app).get('/api/outbox').expect(200);
    expect(res.body.open).toBe(true);
    const message = res.body.messages.find((m: { to: string }) => m.to === email);
    expect(message.text).toMatch(/http:\/\/fizzwright\.test\/reset-password\?token=/);
    const one = await request(app).get(`/api/outbox/${message.id}`).expect(200);
    expect(one.body.subject).toBe(message.subject);
  });
});
