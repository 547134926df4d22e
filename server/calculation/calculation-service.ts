/**
 * The calculation endpoints: one line, synthesis (solve), sweeps, tolerance
 * and side-by-side comparison. Unit strings become SI at the edge; every
 * library error is renamed to its path in the request (`w` → `spec.w`,
 * `points` stays `points`).
 */
import {
  ESTIMATE_NOTE,
  LineInputError,
  calculate,
  kindFields,
  solve,
  sweep,
  tolerance,
  type LineResult,
  type LineSpec,
  type OutputQuantity,
  type Spreads,
  type ToleranceResult,
} from '@linewright/lines';
import { siValue, specToSi, withFieldPath } from './spec-units';

type Quantity = number | string;

export interface CalculationAnswer {
  spec: LineSpec;
  result: LineResult;
  note: string;
}

/** Converts unit strings to SI at the edge, then computes with the shared library. */
export function calculateLine(input: Record<string, unknown>): CalculationAnswer {
  const spec = specToSi(input);
  return { spec, result: withFieldPath('spec', () => calculate(spec)), note: ESTIMATE_NOTE };
}

/**
 * Runs `compute`; a library error on one of the request's own fields (min,
 * points…) is renamed by `ownFields`, anything else is a spec field.
 */
function withRequestPaths<T>(ownFields: Record<string, string>, compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    // The library names its own argument (e.g. 'points'); the client needs the request path.
    if (!(error instanceof LineInputError)) throw error;
    const own = Object.entries(ownFields).find(([name]) => error.field === name || error.field.startsWith(`${name}.`));
    if (own) throw new LineInputError(error.field.replace(own[0], own[1]), error.rule);
    throw error.field.startsWith('spec.') ? error : new LineInputError(`spec.${error.field}`, error.rule);
  }
}

/** A value of the spec's input `field` (its unit from the library's field table). */
function inputValue(spec: LineSpec, field: string, value: Quantity, path: string): number {
  if (typeof value === 'number') return value;
  const description = kindFields(spec.kind).find((entry) => entry.name === field);
  if (!description || description.quantity === 'boolean') throw new LineInputError(path, `a unit string needs a numeric input of ${spec.kind}; send an SI number`);
  return siValue(value, description.quantity, path);
}

export interface SolveRequest {
  spec: Record<string, unknown>;
  unknown: string;
  target: { quantity: OutputQuantity; value: number };
  min?: Quantity;
  max?: Quantity;
}

export function solveLine(request: SolveRequest) {
  const spec = specToSi(request.spec);
  const min = request.min === undefined ? undefined : inputValue(spec, request.unknown, request.min, 'min');
  const max = request.max === undefined ? undefined : inputValue(spec, request.unknown, request.max, 'max');
  const fields = { min: 'min', max: 'max', value: 'target.value', quantity: 'target.quantity', [request.unknown]: 'unknown' };
  const solved = withRequestPaths(fields, () => solve(spec, request.unknown, request.target, { min, max }));
  return { ...solved, note: ESTIMATE_NOTE };
}

export interface SweepRequest {
  spec: Record<string, unknown>;
  field: string;
  from: Quantity;
  to: Quantity;
  points: number;
  spacing?: 'linear' | 'log';
}

export function sweepLine(request: SweepRequest, pointLimit: number) {
  if (request.points > pointLimit) throw new LineInputError('points', `must be at most ${pointLimit} on this server`);
  const spec = specToSi(request.spec);
  const from = inputValue(spec, request.field, request.from, 'from');
  const to = inputValue(spec, request.field, request.to, 'to');
  // An error on the swept input itself means the field or its range is wrong, not the spec.
  const fields = { points: 'points', from: 'from', to: 'to', [request.field]: 'field' };
  const swept = withRequestPaths(fields, () => sweep(spec, request.field, from, to, request.points, { spacing: request.spacing }));
  // Per-point results would be ~1 kB each; the series carry what a chart needs, warnings are listed once.
  const warnings = [...new Set(swept.results.flatMap((result) => result.warnings))];
  return { field: swept.field, x: swept.x, series: swept.series, warnings, note: ESTIMATE_NOTE };
}

export interface ToleranceRequest {
  spec: Record<string, unknown>;
  spreads: Record<string, { plusMinus?: Quantity; plusMinusRelative?: number; distribution?: 'uniform' | 'normal' }>;
  samples: number;
  randomState?: number;
  bins?: number;
}

export function toleranceOfLine(request: ToleranceRequest): ToleranceResult & { note: string } {
  const spec = specToSi(request.spec);
  const spreads: Spreads = {};
  for (const [field, spread] of Object.entries(request.spreads)) {
    const plusMinus = spread.plusMinus === undefined ? undefined : inputValue(spec, field, spread.plusMinus, `spreads.${field}.plusMinus`);
    spreads[field] = { ...spread, plusMinus };
  }
  const fields = { spreads: 'spreads', samples: 'samples', bins: 'bins' };
  const result = withRequestPaths(fields, () => tolerance(spec, spreads, request.samples, { randomState: request.randomState, bins: request.bins }));
  return { ...result, note: ESTIMATE_NOTE };
}

/** Outputs worth a difference column; each appears only when every compared line has it. */
const COMPARED_OUTPUTS: readonly (keyof LineResult)[] = [
  'z0', 'zDiff', 'zOdd', 'zEven', 'zCommon', 'erEff', 'delayPerMeter', 'velocityFactor', 'lPerMeter', 'cPerMeter', 'lossDbPerMeter', 'delay', 'lossDb',
];

export interface Difference {
  values: number[];
  /** Each line minus the first, in the output's SI unit. */
  fromFirst: number[];
  /** The same as a percentage of the first line's value. */
  percentFromFirst: number[];
}

export function compareLines(inputs: Record<string, unknown>[]) {
  const lines = inputs.map((input, index) => {
    const path = `specs[${index}]`;
    const spec = specToSi(input, path);
    return { spec, result: withFieldPath(path, () => calculate(spec)) };
  });
  const differences: Partial<Record<keyof LineResult, Difference>> = {};
  for (const output of COMPARED_OUTPUTS) {
    const values = lines.map((line) => line.result[output]);
    if (!values.every((value): value is number => typeof value === 'number')) continue;
    differences[output] = {
      values,
      fromFirst: values.map((value) => value - values[0]),
      percentFromFirst: values.map((value) => (values[0] === 0 ? 0 : ((value - values[0]) / values[0]) * 100)),
    };
  }
  return { lines, differences, note: ESTIMATE_NOTE };
}
