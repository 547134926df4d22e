#!/usr/bin/env node
// Makes a fresh machine ready for the project's commands: npm dependencies,
// Debian's MariaDB server and (with --browser) Debian's Chromium. Plain Node on
// purpose: it runs before node_modules exists. Never downloads from anywhere but
// the npm registry and Debian's archive.
import { execSync, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const wantsBrowser = process.argv.includes('--browser');

function has(command) {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

function run(command) {
  console.log(`[bootstrap] ${command}`);
  execSync(command, { cwd: root, stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
}

function dependenciesAreCurrent() {
  const installed = join(root, 'node_modules', '.package-lock.json');
  if (!existsSync(installed)) return false;
  return statSync(installed).mtimeMs >= statSync(join(root, 'package-lock.json')).mtimeMs;
}

function aptInstall(packages, why) {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const command = `apt-get update -qq && apt-get install -y -qq --no-install-recommends ${packages.join(' ')}`;
  if (!isRoot) {
    console.error(`[bootstrap] ${why} is missing. Install it as root, then run this command again:\n  sudo sh -c '${command}'`);
    process.exit(1);
  }
  run(command);
}

if (!dependenciesAreCurrent()) run('npm ci --no-audit --no-fund');

// mariadbd lives in /usr/sbin, which is not on every PATH.
const hasMariaDb = has('mariadbd') || existsSync('/usr/sbin/mariadbd');
if (!hasMariaDb) aptInstall(['mariadb-server', 'mariadb-client'], "Debian's mariadb-server");

if (wantsBrowser && !existsSync(process.env.CHROMIUM_PATH ?? '/usr/bin/chromium')) {
  aptInstall(['chromium', 'fonts-dejavu-core'], "Debian's chromium");
}
