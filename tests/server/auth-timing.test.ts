import type { Express } from 'express';
import request from 'supertest';

let app: Express;
let helpers: typeof import('./helpers');
const FLOOR_MS = 200;

beforeAll(async () => {
  process.env.AUTH_RESPONSE_FLOOR_MS = String(FLOOR_MS);
  helpers = require('./helpers');
  app = await helpers.startApp();
});
afterAll(() => helpers.stopApp());

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function timed(body: object, path: string): Promise<number> {
  const started = performance.now();
  await request(app).post(path).send(body).expect(202);
  return performance.now() - started;
}

describe('answers that could tell whether an address has an account', () => {
  it('forgot-password takes the same time for a known and an unknown address', async () => {
    const { email } = await helpers.signUpOwner(app);
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 6; i++) {
      known.push(await timed({ email }, '/api/auth/forgot-password'));
      unknown.push(await timed({ email: helpers.uniqueEmail('nobody') }, '/api/auth/forgot-password'));
    }
    // Both wait out the floor; what is left over is noise of a few milliseconds, far below the floor itself.
    expect(Math.min(...known, ...unknown)).toBeGreaterThanOrEqual(FLOOR_MS - 5);
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(40);
  });

  it('sign-up takes the same time for a new address and one that has an account', async () => {
    const { email } = await helpers.signUpOwner(app);
    const taken: number[] = [];
    const fresh: number[] = [];
    const body = { breweryName: 'Timing Test', name: 'Tess', password: 'timing-pass-1' };
    for (let i = 0; i < 4; i++) {
      taken.push(await timed({ ...body, email }, '/api/auth/sign-up'));
      fresh.push(await timed({ ...body, email: helpers.uniqueEmail('fresh') }, '/api/auth/sign-up'));
    }
    expect(Math.min(...taken, ...fresh)).toBeGreaterThanOrEqual(FLOOR_MS - 5);
    expect(Math.abs(median(taken) - median(fresh))).toBeLessThan(40);
  });
});
