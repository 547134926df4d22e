import knex, { type Knex } from 'knex';
import { fileURLToPath } from 'node:url';
import type { Config } from './config';

export const MIGRATIONS_DIR = fileURLToPath(new URL('../migrations', import.meta.url));
export const SEEDS_DIR = fileURLToPath(new URL('../seeds', import.meta.url));

export function createDatabase(config: Pick<Config, 'database'>): Knex {
  const { host, port, name, user, password } = config.database;
  return knex({
    client: 'mysql2',
    connection: {
      host,
      port,
      database: name,
      user,
      password,
      // mysql2 returns DECIMAL as strings unless asked; the catalog stores numbers.
      decimalNumbers: true,
      charset: 'utf8mb4',
      timezone: 'Z',
    },
    pool: { min: 0, max: 10 },
  });
}

/** Brings the schema up to date and (re)applies the idempotent reference and demo data. */
export async function migrateAndSeed(db: Knex, options: { seed: boolean }): Promise<void> {
  await db.migrate.latest({ directory: MIGRATIONS_DIR, loadExtensions: ['.ts'] });
  if (options.seed) await db.seed.run({ directory: SEEDS_DIR, loadExtensions: ['.ts'] });
}
