import { loadConfig } from '@/server/config';

describe('loadConfig', () => {
  it('defaults to bcrypt cost 12, port 8080, a 12-hour session and data/fizzwright.sqlite', () => {
    const config = loadConfig({});
    expect(config.bcryptCost).toBe(12);
    expect(config.port).toBe(8080);
    expect(config.sessionTtlSeconds).toBe(12 * 3600);
    expect(config.databasePath).toMatch(/data\/fizzwright\.sqlite$/);
  });

  it('is safe as `npm start` leaves it: outbox closed, no CORS, proxy headers ignored, no secret in the source', () => {
    const config = loadConfig({});
    expect(config.outboxOpen).toBe(false);
    expect(config.corsOrigins).toEqual([]);
    expect(config.trustProxy).toBe(false);
    expect(config.jwtSecret).toBeNull();
    expect(config.sessionSecretFile).toMatch(/data\/session-secret$/);
  });

  it('seeds the demo brewery (published passwords) only outside production unless asked', () => {
    expect(loadConfig({}).seedDemo).toBe(true);
    expect(loadConfig({ NODE_ENV: 'production' }).seedDemo).toBe(false);
    expect(loadConfig({ NODE_ENV: 'production', SEED_DEMO: 'true' }).seedDemo).toBe(true);
  });

  it('reads TRUST_PROXY as Express does, and refuses a short JWT_SECRET', () => {
    expect(loadConfig({ TRUST_PROXY: 'true' }).trustProxy).toBe(true);
    expect(loadConfig({ TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ TRUST_PROXY: 'loopback, 10.0.0.0/8' }).trustProxy).toBe('loopback, 10.0.0.0/8');
    expect(() => loadConfig({ JWT_SECRET: 'too-short' })).toThrow(/at least 32 characters/);
  });

  it('lists every bad variable at once', () => {
    expect(() => loadConfig({ PORT: 'eighty', BCRYPT_COST: '99' })).toThrow(
      /PORT[\s\S]*BCRYPT_COST|BCRYPT_COST[\s\S]*PORT/,
    );
  });
});
