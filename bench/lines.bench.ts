/**
 * Throughput of the lines library: `npx tsx bench/lines.bench.ts`.
 * Goal (issue 3): everything a user does while typing — one calculation, a
 * 200-point sweep, a 2,000-sample tolerance run — fits in one 16 ms frame.
 */
import { calculate, kindFields, lineKinds, solve, sweep, tolerance, type LineKind, type LineSpec } from '../projects/lines/src/public-api';

const FRAME_MS = 16;

function defaultSpec(kind: LineKind): LineSpec {
  const spec: Record<string, unknown> = { kind };
  for (const field of kindFields(kind)) if (!field.isOptional) spec[field.name] = field.defaultValue;
  return spec as unknown as LineSpec;
}

/** Milliseconds per call of `run`, timed over at least `minimumMs` after a warm-up. */
function time(run: () => unknown, minimumMs = 200): number {
  for (let index = 0; index < 20; index++) run();
  let calls = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < minimumMs) {
    run();
    calls++;
    elapsed = performance.now() - start;
  }
  return elapsed / calls;
}

const rows: { name: string; msPerOp: number; goal?: string }[] = [];
for (const { kind } of lineKinds) {
  const spec = defaultSpec(kind);
  const lossy = { ...spec, tanDelta: 0.02, frequency: 1e9, length: 0.1 } as LineSpec;
  rows.push({ name: `${kind} static`, msPerOp: time(() => calculate(spec)) });
  rows.push({ name: `${kind} with loss`, msPerOp: time(() => calculate(lossy)) });
}
const microstrip = { ...defaultSpec('microstrip'), tanDelta: 0.02, frequency: 1e9 } as LineSpec;
const pair = defaultSpec('coupled-microstrip');
const spreads = { w: { plusMinus: 25.4e-6 }, h: { plusMinusRelative: 0.1 }, er: { plusMinusRelative: 0.05 } };
const staticMicrostrip = defaultSpec('microstrip');
rows.push({ name: 'sweep 200 points (microstrip, loss)', msPerOp: time(() => sweep(microstrip, 'frequency', 1e8, 2e10, 200)), goal: 'frame' });
rows.push({ name: 'sweep 10,000 points (microstrip, loss)', msPerOp: time(() => sweep(microstrip, 'frequency', 1e8, 2e10, 10_000), 500) });
rows.push({ name: 'solve w for z0 = 50 Ω (microstrip)', msPerOp: time(() => solve(staticMicrostrip, 'w', { quantity: 'z0', value: 50 })), goal: 'frame' });
rows.push({ name: 'solve s for zDiff = 100 Ω (coupled microstrip)', msPerOp: time(() => solve(pair, 's', { quantity: 'zDiff', value: 100 })), goal: 'frame' });
rows.push({ name: 'tolerance 2,000 samples (microstrip, static)', msPerOp: time(() => tolerance(staticMicrostrip, spreads, 2000)), goal: 'frame' });
rows.push({ name: 'tolerance 2,000 samples (microstrip, loss)', msPerOp: time(() => tolerance(microstrip, spreads, 2000)), goal: 'frame' });
rows.push({ name: 'tolerance 10,000 samples (microstrip, static)', msPerOp: time(() => tolerance(staticMicrostrip, spreads, 10_000), 500) });

const singleWorst = Math.max(...rows.filter((row) => row.name.endsWith('loss') || row.name.endsWith('static')).filter((row) => !row.name.startsWith('tolerance')).map((row) => row.msPerOp));
console.log('name'.padEnd(48), 'ops/s'.padStart(12), 'ms/op'.padStart(10), ' goal');
for (const row of rows) {
  const goal = row.goal === 'frame' ? `${row.msPerOp <= FRAME_MS ? 'PASS' : 'MISS'} (≤ ${FRAME_MS} ms)` : '';
  console.log(row.name.padEnd(48), Math.round(1000 / row.msPerOp).toLocaleString('en').padStart(12), row.msPerOp.toFixed(4).padStart(10), ' ' + goal);
}
console.log(`slowest single calculation: ${(singleWorst * 1000).toFixed(1)} µs — ${singleWorst <= FRAME_MS ? 'PASS' : 'MISS'} (≤ ${FRAME_MS} ms)`);
