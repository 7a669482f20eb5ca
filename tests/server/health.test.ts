import type { Express } from 'express';
import request from 'supertest';

import { startApp, stopApp } from './helpers';

let app: Express;
beforeAll(async () => {
  app = await startApp();
});
afterAll(stopApp);

describe('GET /api/health', () => {
  it('answers ok with the database state and version, to anyone', async () => {
    const res = await request(app).get('/api/health').expect(200);
    expect(res.body).toMatchObject({
      status: 'ok',
      db: 'ok',
      // Which database and store depend on how the tests run: `npm test` (SQLite) or `npm run test:pg`.
      dialect: process.env.DATABASE_URL ? 'postgres' : 'sqlite',
      storage: { kind: 'local', bucket: 'fizzwright-uploads' },
      version: expect.stringMatching(/^\d+\.\d+\.\d+/),
      outbox: true,
    });
  });

  it('sets the usual security headers', async () => {
    const res = await request(app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('unknown API routes', () => {
  it('answer 404 in the uniform error shape', async () => {
    const res = await request(app).get('/api/no-such-thing').expect(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: expect.any(String) } });
  });
});

describe('the web app', () => {
  it('serves index.html for client routes, compressed, and leaves unknown API paths to the API', async () => {
    const fs = require('node:fs') as typeof import('node:fs');
    const { config } = require('@/server/config') as typeof import('@/server/config');
    if (!fs.existsSync(`${config.webDistDir}/index.html`)) {
      const res = await request(app).get('/team').set('Accept', 'text/html').expect(503);
      expect(res.text).toMatch(/has not been built/);
      return;
    }
    const res = await request(app).get('/team').set('Accept', 'text/html').set('Accept-Encoding', 'gzip').expect(200);
    expect(res.headers['content-type']).toMatch(/html/);
    expect(res.headers['content-encoding']).toBe('gzip');
  });
});
