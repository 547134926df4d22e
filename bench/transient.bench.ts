/**
 * Speed of the time-domain part: `npx tsx bench/transient.bench.ts`.
 * Goal (issue 6): each response below 20 ms so the step-response screen stays
 * live while the user types.
 */
import { adviseTermination, ladderStepResponse, stepResponse, type StepCircuit } from '../projects/lines/src/public-api';

const GOAL_MS = 20;

/** Median milliseconds per call of `run` over at least `minimumMs`, after a warm-up. */
function time(run: () => unknown, minimumMs = 400): number {
  for (let index = 0; index < 5; index++) run();
  const samples: number[] = [];
  const start = performance.now();
  while (performance.now() - start < minimumMs || samples.length < 5) {
    const t = performance.now();
    run();
    samples.push(performance.now() - t);
  }
  samples.sort((a, b) => a - b);
  return samples[Math.floor(samples.length / 2)];
}

const delay = 1e-9;
// ΓS·ΓL = −0.965: the waves need about 1,000 round trips to fall below double precision.
const lattice: StepCircuit = {
  source: { amplitude: 1, resistance: 0.89, riseTime: 50e-12 },
  line: { z0: 50, delay },
  load: 'open',
};
const lossy: StepCircuit = {
  source: { amplitude: 1, resistance: 25, riseTime: 50e-12 },
  line: { z0: 50, delay, dcResistance: 2, skinResistance: 5, tanDelta: 0.02, referenceFrequency: 1e9 },
  load: { resistance: 1e4, capacitance: 2e-12 },
};
const ladderCircuit: StepCircuit = { ...lattice, source: { ...lattice.source, resistance: 25 }, load: { resistance: 100 } };
const coax: StepCircuit = {
  source: { amplitude: 1, resistance: 50, riseTime: 1e-9 },
  line: { spec: { kind: 'coax', d: 0.9e-3, D: 2.95e-3, er: 2.25, tanDelta: 2e-4 }, length: 10 },
  load: 'open',
};

const latticeRun = stepResponse(lattice, { duration: 2001 * delay });
const rows: { name: string; msPerOp: number; hasGoal: boolean }[] = [
  {
    name: `lattice, 1,000 round trips (${latticeRun.arrivals.length} arrivals, 4,096 samples)`,
    msPerOp: time(() => stepResponse(lattice, { duration: 2001 * delay })),
    hasGoal: true,
  },
  { name: 'lossy line + R∥C load, 4,096 samples (4,097 bins)', msPerOp: time(() => stepResponse(lossy, { duration: 40 * delay, points: 4096 })), hasGoal: true },
  {
    name: 'ladder, 200 sections, 4,096 samples',
    msPerOp: time(() => ladderStepResponse(ladderCircuit, 200, { duration: 20 * delay, points: 4096 })),
    hasGoal: true,
  },
  { name: 'ladder, 200 sections, 2,048 samples', msPerOp: time(() => ladderStepResponse(ladderCircuit, 200, { duration: 20 * delay, points: 2048 })), hasGoal: false },
  { name: 'coax from the calculator, default window', msPerOp: time(() => stepResponse(coax)), hasGoal: false },
  { name: 'termination advisor (5 responses)', msPerOp: time(() => adviseTermination(ladderCircuit)), hasGoal: false },
];

console.log('name'.padEnd(58), 'ops/s'.padStart(8), 'ms/op'.padStart(9), ' goal');
for (const row of rows) {
  const goal = row.hasGoal ? `${row.msPerOp <= GOAL_MS ? 'PASS' : 'MISS'} (≤ ${GOAL_MS} ms)` : '';
  console.log(row.name.padEnd(58), Math.round(1000 / row.msPerOp).toLocaleString('en').padStart(8), row.msPerOp.toFixed(2).padStart(9), ' ' + goal);
}
