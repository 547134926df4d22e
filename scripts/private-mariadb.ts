/**
 * A private MariaDB instance for development and tests: its own data directory
 * under .data/, bound to 127.0.0.1 on its own port, socket and pid file. It never
 * touches the system service. Flags follow what works with Debian's 10.11 build:
 * --no-defaults must come first, or Debian's configuration applies.
 */
import { spawn, spawnSync, execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { userInfo } from 'node:os';
import { join, resolve } from 'node:path';

export interface PrivateMariaDbOptions {
  dataRoot: string;
  port: number;
}

export interface RunningMariaDb {
  socket: string;
  port: number;
  /** Runs SQL as the instance's administrative (socket-authenticated) account. */
  adminSql(sql: string): void;
  stop(): Promise<void>;
}

const BINARY_DIRS = ['/usr/sbin', '/usr/bin'];

function binary(name: string): string {
  for (const dir of BINARY_DIRS) if (existsSync(join(dir, name))) return join(dir, name);
  return name;
}

function sleep(ms: number): Promise<void> {
  return new Promise((done) => setTimeout(done, ms));
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    // kill(pid, 0) throws when no such process exists: that is the answer we want.
    return false;
  }
}

export async function startPrivateMariaDb(options: PrivateMariaDbOptions): Promise<RunningMariaDb> {
  const root = resolve(options.dataRoot);
  const dataDir = join(root, 'data');
  const socket = join(root, 'mariadb.sock');
  const pidFile = join(root, 'mariadb.pid');
  const logFile = join(root, 'mariadb.err');
  const osUser = userInfo().username;
  mkdirSync(root, { recursive: true });

  const ping = () =>
    spawnSync(binary('mariadb-admin'), ['--no-defaults', `--socket=${socket}`, `-u${osUser}`, 'ping'], { stdio: 'ignore' }).status === 0;

  let ownedPid: number | undefined;
  if (!ping()) {
    if (!existsSync(join(dataDir, 'mysql'))) {
      mkdirSync(dataDir, { recursive: true });
      execFileSync(binary('mariadb-install-db'), [
        '--no-defaults',
        `--datadir=${dataDir}`,
        `--user=${osUser}`,
        '--auth-root-authentication-method=socket',
        '--skip-test-db',
        '--skip-name-resolve',
      ], { stdio: ['ignore', 'ignore', 'inherit'] });
    }
    const log = openSync(logFile, 'a');
    const child = spawn(binary('mariadbd'), [
      '--no-defaults',
      `--datadir=${dataDir}`,
      `--user=${osUser}`,
      '--bind-address=127.0.0.1',
      `--port=${options.port}`,
      `--socket=${socket}`,
      `--pid-file=${pidFile}`,
      `--log-error=${logFile}`,
      '--skip-name-resolve',
      '--skip-log-bin',
      '--innodb-buffer-pool-size=64M',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
    ], { detached: true, stdio: ['ignore', log, log] });
    child.unref();
    ownedPid = child.pid;
    const deadline = Date.now() + 30_000;
    while (!ping()) {
      if (Date.now() > deadline || (ownedPid !== undefined && !isAlive(ownedPid))) {
        const tail = existsSync(logFile) ? readFileSync(logFile, 'utf8').split('\n').slice(-15).join('\n') : '';
        throw new Error(`MariaDB did not start on 127.0.0.1:${options.port}. Last lines of ${logFile}:\n${tail}`);
      }
      await sleep(150);
    }
  }

  return {
    socket,
    port: options.port,
    adminSql(sql: string) {
      execFileSync(binary('mariadb'), ['--no-defaults', `--socket=${socket}`, `-u${osUser}`, '-e', sql], { stdio: ['ignore', 'ignore', 'inherit'] });
    },
    async stop() {
      // Only stop an instance this process started; one found running belongs to someone else.
      if (ownedPid === undefined) return;
      spawnSync(binary('mariadb-admin'), ['--no-defaults', `--socket=${socket}`, `-u${osUser}`, 'shutdown'], { stdio: 'ignore' });
      const deadline = Date.now() + 20_000;
      while (isAlive(ownedPid) && Date.now() < deadline) await sleep(100);
      if (isAlive(ownedPid)) process.kill(ownedPid, 'SIGKILL');
    },
  };
}

/** Creates the database and an application account that may use only it. */
export function ensureDatabase(db: RunningMariaDb, name: string, user: string, password: string, recreate = false): void {
  const quoted = password.replace(/'/g, "''");
  db.adminSql([
    recreate ? `DROP DATABASE IF EXISTS \`${name}\`;` : '',
    `CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    `CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY '${quoted}';`,
    `ALTER USER '${user}'@'127.0.0.1' IDENTIFIED BY '${quoted}';`,
    `GRANT ALL PRIVILEGES ON \`${name}\`.* TO '${user}'@'127.0.0.1';`,
  ].join(' '));
}
