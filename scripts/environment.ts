/**
 * The one place that turns the environment into the bootstrap's settings, so
 * `npm start`, `npm test` and `npm run bench` agree on ports and names.
 */
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

export const PROJECT_ROOT = fileURLToPath(new URL('..', import.meta.url));

export type Purpose = 'start' | 'test' | 'bench';

export interface BootstrapSettings {
  dataRoot: string;
  env: NodeJS.ProcessEnv;
}

/**
 * Tests and benchmarks get their own MariaDB instance, port and database so
 * they can run beside a running `npm start` without touching its data.
 */
export function bootstrapSettings(purpose: Purpose): BootstrapSettings {
  const isStart = purpose === 'start';
  const defaults: Record<string, string> = {
    PORT: isStart ? '3000' : purpose === 'test' ? '3100' : '3200',
    DB_PORT: isStart ? '3307' : purpose === 'test' ? '3308' : '3309',
    DB_NAME: isStart ? 'linewright' : `linewright_${purpose}`,
    SMTP_PORT: isStart ? '2525' : purpose === 'test' ? '2526' : '2527',
  };
  const env: NodeJS.ProcessEnv = { ...process.env };
  for (const [name, value] of Object.entries(defaults)) {
    const override = isStart ? process.env[name] : process.env[`${purpose.toUpperCase()}_${name}`];
    env[name] = override || value;
  }
  env['MAIL_CATCHER_DIR'] ||= join(PROJECT_ROOT, '.data', isStart ? 'mail' : `mail-${purpose}`);
  if (!isStart) env['LOG_LEVEL'] = process.env['LOG_LEVEL'] || 'silent';
  // One data directory per instance: a second instance on another port must never share a socket or data files.
  const isDefaultPort = env['DB_PORT'] === defaults['DB_PORT'];
  const folder = `${isStart ? 'mariadb' : `mariadb-${purpose}`}${isDefaultPort ? '' : `-${env['DB_PORT']}`}`;
  return { dataRoot: join(PROJECT_ROOT, '.data', folder), env };
}
