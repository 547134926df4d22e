/**
 * `npm test`: the same bootstrap as `npm start` against a separate test
 * instance and a database recreated per run, then every suite — library,
 * server API, client unit, end-to-end in headless Chromium. Ends with one
 * line `N passed, N failed` and stops what it started, whatever happens.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { startServer } from '../server/main';
import { bringUpDatabase, type Stack } from './bring-up';
import { buildClientIfStale } from './client-build';
import { PROJECT_ROOT } from './environment';
import { runSuite, type SuiteOutcome } from './suite-runner';

const MOCHA = ['node_modules/mocha/bin/mocha.js', '--import=tsx', '--reporter', 'spec'];
const outcomes: SuiteOutcome[] = [];
let stack: Stack | undefined;
let server: Awaited<ReturnType<typeof startServer>> | undefined;

const onlySuites = process.argv.slice(2);
const wants = (name: string) => onlySuites.length === 0 || onlySuites.includes(name);

try {
  stack = await bringUpDatabase('test');
  const outputDir = join(PROJECT_ROOT, 'test-output');
  mkdirSync(outputDir, { recursive: true });
  const env = { ...stack.env, TEST_OUTPUT_DIR: outputDir };

  if (wants('lines')) outcomes.push(await runSuite('lines library', 'node', [...MOCHA, 'test/lines/**/*.spec.ts'], env));
  if (wants('server')) outcomes.push(await runSuite('server API', 'node', [...MOCHA, '--timeout', '20000', '--require', 'test/server/test-app.ts', 'test/server/**/*.spec.ts'], env));
  if (wants('client')) {
    outcomes.push(await runSuite('client unit', 'node', ['node_modules/@angular/cli/bin/ng.js', 'test', 'web', '--watch=false'], { ...env, NG_CLI_ANALYTICS: 'false' }));
  }
  if (wants('e2e')) {
    buildClientIfStale();
    server = await startServer(env);
    outcomes.push(
      await runSuite('end-to-end (Chromium)', 'node', [...MOCHA, '--timeout', '60000', '--require', 'test/e2e/browser.ts', 'test/e2e/**/*.e2e.ts'], { ...env, E2E_BASE_URL: server.url }),
    );
  }
} catch (error) {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  outcomes.push({ name: 'bootstrap', passed: 0, failed: 1, skipped: 0, exitCode: 1 });
} finally {
  await server?.close();
  await stack?.stop();
}

const passed = outcomes.reduce((sum, outcome) => sum + outcome.passed, 0);
const failed = outcomes.reduce((sum, outcome) => sum + outcome.failed, 0);
console.log('');
for (const outcome of outcomes) {
  console.log(`  ${outcome.name.padEnd(24)} ${outcome.passed} passed, ${outcome.failed} failed${outcome.skipped ? `, ${outcome.skipped} skipped` : ''}`);
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);
