/**
 * The real application against the real test database (started by `npm test`),
 * shared by the API suites. Nothing here mocks the database.
 */
import type { Express } from 'express';
import type { Knex } from 'knex';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDatabase } from '../../server/database';
import { createLogger } from '../../server/logger';

export interface TestApp {
  app: Express;
  db: Knex;
}

let shared: TestApp | undefined;

export function testApp(): TestApp {
  if (!shared) {
    // Sign-in limits high enough for the whole suite; rate-limits.spec.ts builds its own app with low ones.
    const config = loadConfig({ LOGIN_RATE_LIMIT: '100000', RESET_RATE_LIMIT: '100000', ...process.env });
    const db = createDatabase(config);
    shared = { app: createApp({ config, db, logger: createLogger('silent') }), db };
  }
  return shared;
}

// Mocha root hook: close the pool once every suite has run, so the process exits.
export const mochaHooks = {
  async afterAll() {
    await shared?.db.destroy();
    shared = undefined;
  },
};
