/**
 * Wires the features that need the database: repositories → services →
 * routes, once per app. Authentication runs first, so every route below can
 * ask requireRole who is calling.
 */
import { Router } from 'express';
import { resolve } from 'node:path';
import type { Knex } from 'knex';
import type { ApiContract } from './api-contract';
import type { Config } from './config';
import { AuthRepository } from './auth/auth-repository';
import { authRoutes } from './auth/auth-routes';
import { Accounts } from './auth/auth-service';
import { authenticate } from './auth/authenticate';
import { AuditLog } from './catalog/audit-log';
import { ConductorsRepository } from './conductors/conductors-repository';
import { conductorsRoutes } from './conductors/conductors-routes';
import { ConductorCatalog } from './conductors/conductors-service';
import { InvitationsRepository } from './invitations/invitations-repository';
import { invitationsRoutes } from './invitations/invitations-routes';
import { Invitations } from './invitations/invitations-service';
import { LineTypesRepository } from './line-types/line-types-repository';
import { lineTypesRoutes } from './line-types/line-types-routes';
import { LineTypeCatalog } from './line-types/line-types-service';
import { CaughtMailStore } from './mail/caught-mail-store';
import { mailRoutes } from './mail/mail-routes';
import { SmtpMailer, type Mailer } from './mail/mail-transport';
import { MaterialsRepository } from './materials/materials-repository';
import { materialsRoutes } from './materials/materials-routes';
import { MaterialCatalog } from './materials/materials-service';
import { StackupFilesRepository } from './stackups/stackup-files-repository';
import { StackupShares } from './stackups/stackup-shares';
import { StackupsRepository } from './stackups/stackups-repository';
import { sharedStackupRoutes, stackupsRoutes } from './stackups/stackups-routes';
import { StackupCatalog } from './stackups/stackups-service';
import { TokensRepository } from './tokens/tokens-repository';
import { tokensRoutes } from './tokens/tokens-routes';
import { PersonalTokens } from './tokens/tokens-service';
import { UsersRepository } from './users/users-repository';
import { usersRoutes } from './users/users-routes';
import { TeamMembers } from './users/users-service';

export interface FeatureDependencies {
  config: Readonly<Config>;
  db: Knex;
  contract: ApiContract;
  mailer?: Mailer;
}

export function buildFeatures({ config, db, contract, mailer = new SmtpMailer(config) }: FeatureDependencies): Router {
  const users = new UsersRepository(db);
  const tokens = new PersonalTokens(new TokensRepository(db));
  const accounts = new Accounts(db, config, users, new AuthRepository(db), mailer);
  const invitations = new Invitations(db, config, new InvitationsRepository(db), users, mailer);

  const audit = new AuditLog(db);
  const materialsRepository = new MaterialsRepository(db);
  const conductorsRepository = new ConductorsRepository(db);
  const lineTypesRepository = new LineTypesRepository(db);
  const stackupsRepository = new StackupsRepository(db);
  const usedBy = (column: 'material_id' | 'conductor_id') => [
    { noun: 'line type', count: (id: number) => lineTypesRepository.countUsing(column, id) },
    { noun: 'stackup', count: (id: number) => stackupsRepository.countUsing(column === 'material_id' ? 'materialId' : 'conductorId', id) },
  ];
  const materials = new MaterialCatalog(db, materialsRepository, audit, usedBy('material_id'));
  const conductors = new ConductorCatalog(db, conductorsRepository, audit, usedBy('conductor_id'));
  const lineTypes = new LineTypeCatalog(db, lineTypesRepository, audit, materialsRepository, conductorsRepository, contract.schemaValidator('LineSpec'));
  const stackupFiles = new StackupFilesRepository(db);
  const stackupUploads = { noun: 'uploaded file', count: (id: number) => stackupFiles.countUploads(id) };
  const stackups = new StackupCatalog(db, stackupsRepository, audit, materialsRepository, conductorsRepository, lineTypesRepository, stackupUploads);
  const stackupShares = new StackupShares(config, stackupFiles, mailer);

  const router = Router()
    .use(authenticate(config, users, tokens))
    .use(authRoutes(contract, config, accounts))
    .use(usersRoutes(contract, new TeamMembers(users)))
    .use(invitationsRoutes(contract, config, invitations, accounts))
    .use(tokensRoutes(contract, tokens))
    .use(materialsRoutes(contract, config, materials))
    .use(conductorsRoutes(contract, conductors))
    .use(lineTypesRoutes(contract, lineTypes))
    .use(stackupsRoutes(contract, config, stackups, stackupShares, stackupFiles))
    .use(sharedStackupRoutes(contract, stackups, stackupShares));
  // The caught-mail page exists only outside production.
  if (!config.isProduction) router.use(mailRoutes(contract, new CaughtMailStore(resolve(config.mailCatcherDir))));
  return router;
}
