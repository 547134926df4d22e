/**
 * `npm run bench`: runs every bench/*.bench.ts in its own process, one after
 * another so they do not compete for the two cores, and prints each one's table.
 * Speed goals are measured here, never in timed tests.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from './environment';

const only = process.argv.slice(2);
const files = readdirSync(join(PROJECT_ROOT, 'bench'))
  .filter((file) => file.endsWith('.bench.ts'))
  .filter((file) => only.length === 0 || only.some((name) => file.startsWith(name)))
  .sort();

let failures = 0;
for (const file of files) {
  console.log(`\n━━ ${file} ━━`);
  const run = spawnSync('node', ['--import', 'tsx', '--expose-gc', join('bench', file)], { cwd: PROJECT_ROOT, stdio: 'inherit' });
  if (run.status !== 0) failures += 1;
}
process.exit(failures > 0 ? 1 : 0);
