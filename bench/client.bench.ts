/**
 * Client figures: the initial JavaScript a first visit downloads (gzip), and
 * the keystroke-to-result times the e2e suite recorded in Chromium.
 * Goals (issue 5): initial JS under 350 kB gzip; every kind under one 16 ms frame.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { buildClientIfStale, CLIENT_INDEX } from '../scripts/client-build';
import { PROJECT_ROOT } from '../scripts/environment';

const INITIAL_JS_GOAL_BYTES = 350 * 1024;
const FRAME_MS = 16;

buildClientIfStale();
const browserDir = join(PROJECT_ROOT, 'dist/web/browser');
const index = readFileSync(CLIENT_INDEX, 'utf8');
// The initial load is the entry script plus the chunks index.html preloads; lazy routes are not in it.
const initial = [...index.matchAll(/(?:src|href)="([^"]+\.js)"/g)].map((match) => match[1]);
let total = 0;
console.log('initial JavaScript (gzip)');
for (const file of initial) {
  const size = gzipSync(readFileSync(join(browserDir, file))).length;
  total += size;
  console.log(`  ${file.padEnd(28)} ${(size / 1024).toFixed(1).padStart(8)} kB`);
}
console.log(`  ${'total'.padEnd(28)} ${(total / 1024).toFixed(1).padStart(8)} kB   goal < 350 kB: ${total < INITIAL_JS_GOAL_BYTES ? 'PASS' : 'MISS'}`);

const timings = join(PROJECT_ROOT, 'test-output/perf/keystroke-to-result.json');
if (existsSync(timings)) {
  const { measuredAt, medianMs } = JSON.parse(readFileSync(timings, 'utf8')) as { measuredAt: string; medianMs: Record<string, number> };
  console.log(`\nkeystroke → updated result, median of 9 edits in headless Chromium (recorded by npm test at ${measuredAt})`);
  for (const [kind, ms] of Object.entries(medianMs)) {
    console.log(`  ${kind.padEnd(22)} ${ms.toFixed(1).padStart(6)} ms   goal < ${FRAME_MS} ms: ${ms < FRAME_MS ? 'PASS' : 'MISS'}`);
  }
} else {
  console.log('\nkeystroke timings: run `npm test` first (its e2e suite records them in test-output/perf/).');
}
