/**
 * Speed and memory of the 2D field solver: `npx tsx bench/field.bench.ts`.
 * Goal (issue 7): a typical single microstrip and a typical coupled stripline
 * each solved to 0.5 % estimated error in under 1 s on the 2-core machine.
 * Memory comes from process.memoryUsage(), sampled after every grid (the
 * library itself has no Node imports).
 */
import { fieldSolveLine, type LineSpec } from '../projects/lines/src/public-api';

const GOAL_MS = 1000;
const GOAL_ERROR = 0.005;
const RUNS = 5;
const mm = 1e-3;

interface Case {
  name: string;
  spec: LineSpec;
  tolerance: number;
  isGoal: boolean;
}

const cases: Case[] = [
  { name: 'microstrip w 0.3, h 0.17, t 0.035 mm, εr 4.2', spec: { kind: 'microstrip', w: 0.3 * mm, h: 0.17 * mm, t: 0.035 * mm, er: 4.2 }, tolerance: GOAL_ERROR, isGoal: true },
  {
    name: 'coupled stripline w 0.1, s 0.15, b 0.4, t 0.017 mm, εr 4.0',
    spec: { kind: 'coupled-stripline', w: 0.1 * mm, s: 0.15 * mm, b: 0.4 * mm, t: 0.017 * mm, er: 4 },
    tolerance: GOAL_ERROR,
    isGoal: true,
  },
  { name: 'coupled microstrip w 0.15, s 0.2, h 0.1 mm', spec: { kind: 'coupled-microstrip', w: 0.15 * mm, s: 0.2 * mm, h: 0.1 * mm, t: 0.035 * mm, er: 4.2 }, tolerance: GOAL_ERROR, isGoal: false },
  { name: 'grounded CPW w 0.3, g 0.15, h 0.5 mm', spec: { kind: 'cpw', w: 0.3 * mm, g: 0.15 * mm, h: 0.5 * mm, t: 0.035 * mm, er: 4.2, grounded: true }, tolerance: GOAL_ERROR, isGoal: false },
  { name: 'coax d 0.9, D 2.95 mm', spec: { kind: 'coax', d: 0.9 * mm, D: 2.95 * mm, er: 2.25 }, tolerance: GOAL_ERROR, isGoal: false },
  { name: 'zero-thickness stripline w 0.15, b 0.5 mm', spec: { kind: 'stripline', w: 0.15 * mm, b: 0.5 * mm, t: 0, er: 4 }, tolerance: GOAL_ERROR, isGoal: false },
  { name: 'microstrip (as above) to 0.1 %', spec: { kind: 'microstrip', w: 0.3 * mm, h: 0.17 * mm, t: 0.035 * mm, er: 4.2 }, tolerance: 0.001, isGoal: false },
  {
    name: 'coupled stripline (as above) to 0.1 %',
    spec: { kind: 'coupled-stripline', w: 0.1 * mm, s: 0.15 * mm, b: 0.4 * mm, t: 0.017 * mm, er: 4 },
    tolerance: 0.001,
    isGoal: false,
  },
];

const MB = 1024 * 1024;
console.log(`baseline before any solve: rss ${(process.memoryUsage().rss / MB).toFixed(0)} MB (Node + tsx)`);
console.log(
  'name'.padEnd(58),
  'cold ms'.padStart(8),
  'median ms'.padStart(10),
  'z0 Ω'.padStart(8),
  'est. err'.padStart(9),
  'cells'.padStart(8),
  'peak rss MB'.padStart(12),
  'arrays MB'.padStart(10),
  ' goal',
);
for (const { name, spec, tolerance, isGoal } of cases) {
  const times: number[] = [];
  let peakRss = 0;
  let peakArrays = 0;
  let last: Awaited<ReturnType<typeof fieldSolveLine>> | undefined;
  for (let run = 0; run <= RUNS; run++) {
    const start = performance.now();
    last = await fieldSolveLine(spec, {
      tolerance,
      onProgress: () => {
        const usage = process.memoryUsage();
        peakRss = Math.max(peakRss, usage.rss);
        peakArrays = Math.max(peakArrays, usage.arrayBuffers);
      },
    });
    times.push(performance.now() - start);
  }
  const cold = times[0]!;
  const warm = times.slice(1).sort((a, b) => a - b);
  const median = warm[Math.floor(warm.length / 2)]!;
  const goal = isGoal ? `${median <= GOAL_MS && cold <= GOAL_MS && last!.estimatedError <= GOAL_ERROR ? 'PASS' : 'MISS'} (≤ ${GOAL_MS} ms cold and warm, ≤ ${GOAL_ERROR * 100} %)` : '';
  console.log(
    name.padEnd(58),
    cold.toFixed(0).padStart(8),
    median.toFixed(0).padStart(10),
    last!.z0.toFixed(2).padStart(8),
    `${(last!.estimatedError * 100).toFixed(2)} %`.padStart(9),
    String(last!.cells).padStart(8),
    (peakRss / MB).toFixed(0).padStart(12),
    (peakArrays / MB).toFixed(1).padStart(10),
    ' ' + goal,
  );
}
