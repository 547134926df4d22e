/**
 * Runs one test suite in a child process, streams its output, and reads its
 * pass/fail counts from the runner's closing lines (mocha's spec reporter or
 * Vitest's summary).
 */
import { spawn } from 'node:child_process';
import { PROJECT_ROOT } from './environment';

export interface SuiteOutcome {
  name: string;
  passed: number;
  failed: number;
  skipped: number;
  exitCode: number;
}

// Colour codes would split the numbers from their words.
const ANSI = /\u001b\[[0-9;]*m/g;

export function countsFromOutput(output: string): Pick<SuiteOutcome, 'passed' | 'failed' | 'skipped'> {
  const text = output.replace(ANSI, '');
  const number = (pattern: RegExp) => Number(pattern.exec(text)?.[1] ?? 0);
  const vitest = /^\s*Tests\s+(.*)$/m.exec(text)?.[1];
  if (vitest) {
    return {
      passed: Number(/(\d+) passed/.exec(vitest)?.[1] ?? 0),
      failed: Number(/(\d+) failed/.exec(vitest)?.[1] ?? 0),
      skipped: Number(/(\d+) skipped/.exec(vitest)?.[1] ?? 0),
    };
  }
  return {
    passed: number(/^\s*(\d+) passing/m),
    failed: number(/^\s*(\d+) failing/m),
    skipped: number(/^\s*(\d+) pending/m),
  };
}

export function runSuite(name: string, command: string, args: string[], env: NodeJS.ProcessEnv): Promise<SuiteOutcome> {
  console.log(`\n━━ ${name} ━━`);
  return new Promise((done) => {
    let output = '';
    const child = spawn(command, args, { cwd: PROJECT_ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
    const collect = (stream: NodeJS.WriteStream) => (chunk: Buffer) => {
      output += chunk.toString();
      stream.write(chunk);
    };
    child.stdout.on('data', collect(process.stdout));
    child.stderr.on('data', collect(process.stderr));
    child.on('close', (code) => {
      const counts = countsFromOutput(output);
      const exitCode = code ?? 1;
      // A runner that crashed before reporting still counts as one failure.
      const failed = exitCode !== 0 && counts.failed === 0 ? 1 : counts.failed;
      done({ name, ...counts, failed, exitCode });
    });
  });
}
