/**
 * The shared bootstrap behind the project's commands: a private MariaDB, the
 * application database and account, migrations and seeds.
 */
import { loadConfig, type Config } from '../server/config';
import { createDatabase, migrateAndSeed } from '../server/database';
import { CaughtMailStore } from '../server/mail/caught-mail-store';
import { startMailCatcher, type RunningMailCatcher } from '../server/mail/mail-catcher';
import { ensureDatabase, startPrivateMariaDb, type RunningMariaDb } from './private-mariadb';
import { bootstrapSettings, type Purpose } from './environment';

export interface Stack {
  env: NodeJS.ProcessEnv;
  config: Readonly<Config>;
  mariadb: RunningMariaDb;
  mailCatcher: RunningMailCatcher;
  stop(): Promise<void>;
}

export async function bringUpDatabase(purpose: Purpose, log: (line: string) => void = console.log): Promise<Stack> {
  const { dataRoot, env } = bootstrapSettings(purpose);
  const config = loadConfig(env);
  const started = Date.now();
  const mariadb = await startPrivateMariaDb({ dataRoot, port: config.database.port });
  log(`MariaDB answering on 127.0.0.1:${config.database.port} (${Date.now() - started} ms)`);
  ensureDatabase(mariadb, config.database.name, config.database.user, config.database.password, purpose !== 'start');
  const db = createDatabase(config);
  try {
    await migrateAndSeed(db, { seed: true });
  } finally {
    await db.destroy();
  }
  log(`Database "${config.database.name}" migrated and seeded`);
  // Tests and benchmarks start with an empty mailbox; `npm start` keeps what it caught before.
  if (purpose !== 'start') new CaughtMailStore(config.mailCatcherDir).clear();
  let mailCatcher: RunningMailCatcher;
  try {
    mailCatcher = await startMailCatcher({ port: config.smtp.port, dir: config.mailCatcherDir });
  } catch (error) {
    await mariadb.stop();
    throw new Error(`The local mail catcher could not listen on 127.0.0.1:${config.smtp.port}: ${(error as Error).message}`);
  }
  log(`Mail catcher on 127.0.0.1:${config.smtp.port} (caught mail: ${config.mailCatcherDir})`);
  return {
    env,
    config,
    mariadb,
    mailCatcher,
    async stop() {
      await mailCatcher.stop();
      await mariadb.stop();
    },
  };
}
