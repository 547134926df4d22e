import { Router } from 'express';
import type { Knex } from 'knex';
import type { ApiContract } from '../api-contract';

const STARTED_AT = Date.now();

export function healthRoutes(contract: ApiContract, db: Knex, version: string): Router {
  return Router().get('/health', contract.validate('getHealth'), async (_req, res) => {
    let database: 'ok' | 'unavailable' = 'ok';
    try {
      await db.raw('select 1');
    } catch {
      // The health route reports the database's state instead of failing with it.
      database = 'unavailable';
    }
    res.status(database === 'ok' ? 200 : 503).json({
      status: database === 'ok' ? 'ok' : 'degraded',
      database,
      version,
      uptimeSeconds: (Date.now() - STARTED_AT) / 1000,
    });
  });
}
