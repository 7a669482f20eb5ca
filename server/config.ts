import path from 'node:path';

import * as yup from 'yup';

import pkg from '../package.json';

/** Repository root: every relative path in the configuration is taken from here. */
export const ROOT_DIR = path.resolve(__dirname, '..');

const envSchema = yup.object({
  NODE_ENV: yup.string().oneOf(['development', 'production', 'test']).default('development'),
  PORT: yup.number().integer().min(0).max(65535).default(8080),
  HOST: yup.string().default('0.0.0.0'),
  DATABASE_PATH: yup.string().default('data/fizzwright.sqlite'),
  JWT_SECRET: yup.string().min(16, 'JWT_SECRET must have at least 16 characters.'),
  APP_URL: yup.string().url('APP_URL must be a URL such as http://localhost:8080.'),
  SMTP_URL: yup.string().default(''),
  MAIL_FROM: yup.string().default('Fizzwright <no-reply@fizzwright.local>'),
  BCRYPT_COST: yup.number().integer().min(4).max(15).default(12),
  AUTH_RATE_LIMIT: yup.number().integer().min(1).default(30),
  OUTBOX_OPEN: yup.boolean(),
  SEED_DEMO: yup.boolean().default(true),
  NUTRIENT_DATA_DIR: yup.string().default('../shared/data/usda-sr25'),
  LOG_LEVEL: yup.string().oneOf(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']),
  CORS_ORIGINS: yup.string().default('http://localhost:8081'),
  BENCH_ROUTES: yup.boolean().default(false),
  UPLOADS_DIR: yup.string().default('data/uploads'),
  UPLOAD_MAX_MB: yup.number().positive().max(100).default(10),
});

export interface Config {
  env: 'development' | 'production' | 'test';
  version: string;
  port: number;
  host: string;
  databasePath: string;
  jwtSecret: string;
  /** Session lifetime in seconds (12 h). */
  sessionTtlSeconds: number;
  /** Public address used in e-mail links. Without APP_URL it follows the port the server listens on. */
  appUrl: string;
  appUrlConfigured: boolean;
  smtpUrl: string;
  mailFrom: string;
  bcryptCost: number;
  authRateLimitPerMinute: number;
  /** True when anyone may read the local outbox, signed in or not (development only). */
  outboxOpen: boolean;
  seedDemo: boolean;
  nutrientDataDir: string;
  logLevel: string;
  corsOrigins: string[];
  webDistDir: string;
  /** Mounts /api/bench, the do-nothing reference endpoint `npm run bench` measures against. */
  benchRoutes: boolean;
  uploadsDir: string;
  uploadMaxBytes: number;
}

const DEV_SECRET = 'fizzwright-development-secret-not-for-production';

/** Reads and validates the environment once. Throws with every problem listed when something is off. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const clean = Object.fromEntries(Object.entries(env).filter(([, value]) => value !== ''));
  let parsed: yup.InferType<typeof envSchema>;
  try {
    parsed = envSchema.validateSync(clean, { abortEarly: false, stripUnknown: true });
  } catch (error) {
    const problems = error instanceof yup.ValidationError ? error.errors.join('\n  ') : String(error);
    throw new Error(`Configuration is not valid:\n  ${problems}`);
  }
  const nodeEnv = parsed.NODE_ENV as Config['env'];
  if (nodeEnv === 'production' && !parsed.JWT_SECRET) {
    throw new Error('Configuration is not valid:\n  JWT_SECRET is required when NODE_ENV=production.');
  }
  const port = parsed.PORT;
  return {
    env: nodeEnv,
    version: pkg.version,
    port,
    host: parsed.HOST,
    databasePath: path.resolve(ROOT_DIR, parsed.DATABASE_PATH),
    jwtSecret: parsed.JWT_SECRET ?? DEV_SECRET,
    sessionTtlSeconds: 12 * 60 * 60,
    appUrl: (parsed.APP_URL ?? `http://localhost:${port}`).replace(/\/$/, ''),
    appUrlConfigured: Boolean(parsed.APP_URL),
    smtpUrl: parsed.SMTP_URL,
    mailFrom: parsed.MAIL_FROM,
    bcryptCost: parsed.BCRYPT_COST,
    authRateLimitPerMinute: parsed.AUTH_RATE_LIMIT,
    outboxOpen: parsed.OUTBOX_OPEN ?? nodeEnv === 'development',
    seedDemo: parsed.SEED_DEMO,
    nutrientDataDir: path.resolve(ROOT_DIR, parsed.NUTRIENT_DATA_DIR),
    logLevel: parsed.LOG_LEVEL ?? (nodeEnv === 'test' ? 'silent' : 'info'),
    corsOrigins: parsed.CORS_ORIGINS.split(',').map((origin) => origin.trim()).filter(Boolean),
    webDistDir: path.resolve(ROOT_DIR, 'dist'),
    benchRoutes: parsed.BENCH_ROUTES,
    uploadsDir: path.resolve(ROOT_DIR, parsed.UPLOADS_DIR),
    uploadMaxBytes: Math.round(parsed.UPLOAD_MAX_MB * 1024 * 1024),
  };
}

export const config: Config = loadConfig();
