/**
 * Speed of the stackup library: `npx tsx bench/stackup.bench.ts`.
 * Goal: the editor recomputes the whole impedance table (derivation, calculate,
 * fabrication-spread corners and sensitivities) on every edit, so a 10-line
 * table on the 8-layer template should take under 50 ms on the 2-core machine;
 * a width solve under 10 ms. The goals are ours (a keystroke budget), not a source's.
 */
import { impedanceTable, lineGeometryFor, solveLineDimension, stackupTemplate, type LinePlacement } from '../projects/lines/src/public-api';

const RUNS = 30;
const mm = 1e-3;
const stack = stackupTemplate(8);
/** Copper layers of the 8-layer template that carry lines: L1 (1), L3 (5), L6 (11), L8 (15). */
const SIGNAL_LAYERS = [1, 5, 11, 15];
const placements: LinePlacement[] = Array.from({ length: 10 }, (_, index) => ({
  label: `line ${index + 1}`,
  layerIndex: SIGNAL_LAYERS[index % SIGNAL_LAYERS.length],
  structure: index % 2 === 0 ? 'single' : 'pair',
  targetImpedance: index % 2 === 0 ? 50 : 100,
  tolerance: 0.1,
  width: 0.12 * mm,
  ...(index % 2 === 0 ? {} : { gap: 0.15 * mm }),
}));

function millisPerRun(action: () => unknown): number {
  action();
  const started = performance.now();
  for (let run = 0; run < RUNS; run++) action();
  return (performance.now() - started) / RUNS;
}

const rows = [
  { name: 'lineGeometryFor, inner offset layer', ms: millisPerRun(() => lineGeometryFor(stack, 5, 'single', { width: 0.12 * mm })), goal: undefined },
  { name: 'solveLineDimension, 50 Ω on L1', ms: millisPerRun(() => solveLineDimension(stack, 1, 'single', 50, {})), goal: 10 },
  { name: 'solveLineDimension, 100 Ω pair on L3', ms: millisPerRun(() => solveLineDimension(stack, 5, 'pair', 100, { gap: 0.15 * mm })), goal: 10 },
  { name: 'impedanceTable, 10 lines, 8 layers', ms: millisPerRun(() => impedanceTable(stack, placements)), goal: 50 },
];

console.log('name'.padEnd(42), 'ms/op'.padStart(10), 'ops/s'.padStart(10), '  goal');
for (const row of rows) {
  const verdict = row.goal === undefined ? '' : `${row.ms <= row.goal ? 'PASS' : 'MISS'} (< ${row.goal} ms)`;
  console.log(row.name.padEnd(42), row.ms.toFixed(3).padStart(10), (1000 / row.ms).toFixed(0).padStart(10), ' ', verdict);
}
