/**
 * Configuration, read once from the environment, checked and frozen.
 * Every variable and its default is listed in .env.example.
 */
export interface Config {
  host: string;
  port: number;
  /** Public base URL used in e-mailed links. */
  appUrl: string;
  isProduction: boolean;
  database: { host: string; port: number; name: string; user: string; password: string };
  jwtSecret: string;
  /** Lifetime of a sign-in token [s]. */
  jwtLifetimeSeconds: number;
  smtp: { host: string; port: number; from: string };
  /** Where the local SMTP catcher stores caught mail (development and tests only). */
  mailCatcherDir: string;
  /** Requests per window allowed per client address on sign-in and on password-reset requests. */
  rateLimits: { windowSeconds: number; login: number; passwordReset: number };
  /** Directory of the built Angular client; served when it exists. */
  clientDir: string;
  limits: { bodyBytes: number; sweepPoints: number; csvBytes: number };
}

const DEVELOPMENT_JWT_SECRET = 'linewright-development-secret-change-me';

function integer(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`Configuration: ${name} must be a positive integer, got "${raw}".`);
  return value;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Readonly<Config> {
  const isProduction = env['NODE_ENV'] === 'production';
  const host = env['HOST'] || '127.0.0.1';
  const port = integer(env, 'PORT', 3000);
  const jwtSecret = env['JWT_SECRET'] || DEVELOPMENT_JWT_SECRET;
  if (isProduction && jwtSecret === DEVELOPMENT_JWT_SECRET) {
    throw new Error('Configuration: JWT_SECRET must be set in production.');
  }
  return Object.freeze({
    host,
    port,
    appUrl: env['APP_URL'] || `http://${host}:${port}`,
    isProduction,
    database: Object.freeze({
      host: env['DB_HOST'] || '127.0.0.1',
      port: integer(env, 'DB_PORT', 3307),
      name: env['DB_NAME'] || 'linewright',
      user: env['DB_USER'] || 'linewright',
      password: env['DB_PASSWORD'] || 'linewright-local',
    }),
    jwtSecret,
    jwtLifetimeSeconds: integer(env, 'JWT_LIFETIME_SECONDS', 8 * 3600),
    smtp: Object.freeze({
      host: env['SMTP_HOST'] || '127.0.0.1',
      port: integer(env, 'SMTP_PORT', 2525),
      from: env['MAIL_FROM'] || 'Linewright <linewright@localhost>',
    }),
    mailCatcherDir: env['MAIL_CATCHER_DIR'] || '.data/mail',
    rateLimits: Object.freeze({
      windowSeconds: integer(env, 'RATE_LIMIT_WINDOW_SECONDS', 15 * 60),
      login: integer(env, 'LOGIN_RATE_LIMIT', 10),
      passwordReset: integer(env, 'RESET_RATE_LIMIT', 5),
    }),
    clientDir: env['CLIENT_DIR'] || 'dist/web/browser',
    limits: Object.freeze({
      bodyBytes: integer(env, 'BODY_LIMIT_BYTES', 256 * 1024),
      sweepPoints: integer(env, 'SWEEP_POINT_LIMIT', 10_000),
      csvBytes: integer(env, 'CSV_LIMIT_BYTES', 1024 * 1024),
    }),
  });
}
