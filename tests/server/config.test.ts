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

  it('uses PostgreSQL only when DATABASE_URL is set, and then requires JWT_SECRET shared by every instance', () => {
    expect(loadConfig({}).databaseUrl).toBeNull();
    expect(() => loadConfig({ DATABASE_URL: 'postgres://fizz:pw@db.internal:5432/fizz' })).toThrow(
      /JWT_SECRET is required with DATABASE_URL/,
    );
    const config = loadConfig({ DATABASE_URL: 'postgres://fizz:pw@db.internal:5432/fizz', JWT_SECRET: 'x'.repeat(32) });
    expect(config.databaseUrl).toBe('postgres://fizz:pw@db.internal:5432/fizz');
    expect(() => loadConfig({ DATABASE_URL: 'mysql://db/fizz' })).toThrow(/DATABASE_URL must be a PostgreSQL address/);
  });

  it('keeps caches long on one machine and short when instances share PostgreSQL, unless told', () => {
    expect(loadConfig({}).cacheTtlMs).toBe(600_000);
    expect(loadConfig({ DATABASE_URL: 'postgres://h/db', JWT_SECRET: 'x'.repeat(32) }).cacheTtlMs).toBe(5_000);
    expect(loadConfig({ CACHE_TTL_MS: '1000' }).cacheTtlMs).toBe(1_000);
  });

  it('keeps files in the local fake unless S3_BUCKET names a bucket', () => {
    expect(loadConfig({}).s3.bucket).toBeNull();
    const s3 = loadConfig({
      S3_BUCKET: 'brewery-files',
      S3_ENDPOINT: 'https://objects.example.com',
      S3_REGION: 'eu-west-1',
    }).s3;
    expect(s3).toEqual({
      bucket: 'brewery-files',
      endpoint: 'https://objects.example.com',
      region: 'eu-west-1',
      forcePathStyle: false,
    });
    expect(() => loadConfig({ S3_BUCKET: 'Not A Bucket' })).toThrow(/S3_BUCKET must be a bucket name/);
  });

  it('lists every bad variable at once', () => {
    expect(() => loadConfig({ PORT: 'eighty', BCRYPT_COST: '99' })).toThrow(
      /PORT[\s\S]*BCRYPT_COST|BCRYPT_COST[\s\S]*PORT/,
    );
  });
});
