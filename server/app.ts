/**
 * Builds the Express application from its dependencies. No listening here:
 * main.ts listens, tests hand the app to supertest.
 */
import express, { type Express } from 'express';
import helmet from 'helmet';
import cookieParser from 'cookie-parser';
import { pinoHttp } from 'pino-http';
import swaggerUi from 'swagger-ui-express';
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Knex } from 'knex';
import type { Logger } from 'pino';
import type { Config } from './config';
import { ApiContract, OPENAPI_PATH } from './api-contract';
import { Problem, problemHandler } from './errors';
import { healthRoutes } from './system/health-routes';
import { calculationRoutes } from './calculation/calculation-routes';
import { stepResponseRoutes } from './step-response/step-response-routes';
import { FieldSolver } from './field-solve/field-solve-service';
import { fieldSolveRoutes } from './field-solve/field-solve-routes';
import { buildFeatures } from './features';
import type { Mailer } from './mail/mail-transport';

export interface AppDependencies {
  config: Readonly<Config>;
  db: Knex;
  logger: Logger;
  contract?: ApiContract;
  /** Outgoing mail; SMTP per config unless a test hands in another. */
  mailer?: Mailer;
}

export function createApp({ config, db, logger, contract = new ApiContract(), mailer }: AppDependencies): Express {
  const app = express();
  const version = (contract.document['info'] as { version: string }).version;
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(helmet());
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/v1/health' } }));
  app.use(express.json({ limit: config.limits.bodyBytes }));
  app.use(cookieParser());

  const api = express.Router();
  api.use(healthRoutes(contract, db, version));
  api.use(calculationRoutes(contract, config));
  api.use(stepResponseRoutes(contract));
  api.use(fieldSolveRoutes(contract, new FieldSolver()));
  api.use(buildFeatures({ config, db, contract, mailer }));
  api.use(() => {
    throw Problem.notFound('No such API route.');
  });
  app.use('/api/v1', api);

  app.get('/api/openapi.yaml', (_req, res) => {
    res.type('application/yaml').send(readFileSync(OPENAPI_PATH, 'utf8'));
  });
  app.use('/api/docs', swaggerUi.serve, swaggerUi.setup(contract.document, { customSiteTitle: 'Linewright API' }));

  serveClient(app, resolve(config.clientDir));
  app.use(problemHandler(logger));
  return app;
}

/** The built Angular client, with index.html as the fallback for its routes. */
function serveClient(app: Express, clientDir: string): void {
  const index = join(clientDir, 'index.html');
  if (!existsSync(index)) return;
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  app.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
