/** Builds the Angular client when its sources are newer than the last build. */
import { execSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { PROJECT_ROOT } from './environment';

const SOURCES = ['projects/web', 'projects/lines/src', 'angular.json', 'tsconfig.json', 'package-lock.json'];
export const CLIENT_INDEX = join(PROJECT_ROOT, 'dist/web/browser/index.html');

function newestChange(path: string): number {
  const stats = statSync(path);
  if (!stats.isDirectory()) return stats.mtimeMs;
  return readdirSync(path).reduce((newest, entry) => Math.max(newest, newestChange(join(path, entry))), stats.mtimeMs);
}

export function buildClientIfStale(log: (line: string) => void = console.log): void {
  const sourcesChanged = Math.max(...SOURCES.map((source) => newestChange(join(PROJECT_ROOT, source))));
  if (existsSync(CLIENT_INDEX) && statSync(CLIENT_INDEX).mtimeMs > sourcesChanged) {
    log('Client build is up to date');
    return;
  }
  log('Building the client (ng build)…');
  execSync('npx ng build web --configuration production', { cwd: PROJECT_ROOT, stdio: 'inherit', env: { ...process.env, NG_CLI_ANALYTICS: 'false' } });
}
