import { loadConfig } from '@/server/config';

describe('loadConfig', () => {
  it('defaults to bcrypt cost 12, port 8080, a 12-hour session and data/fizzwright.sqlite', () => {
    const config = loadConfig({});
    expect(config.bcryptCost).toBe(12);
    expect(config.port).toBe(8080);
    expect(config.sessionTtlSeconds).toBe(12 * 3600);
    expect(config.databasePath).toMatch(/data\/fizzwright\.sqlite$/);
    expect(config.outboxOpen).toBe(true);
  });

  it('requires JWT_SECRET in production and closes the outbox there', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET is required/);
    const config = loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'a-secret-of-sufficient-length' });
    expect(config.outboxOpen).toBe(false);
  });

  it('lists every bad variable at once', () => {
    expect(() => loadConfig({ PORT: 'eighty', BCRYPT_COST: '99' })).toThrow(/PORT[\s\S]*BCRYPT_COST|BCRYPT_COST[\s\S]*PORT/);
  });
});
