/**
 * Synthesis: find the one input that makes an output hit a target.
 */
import { calculate, calculateLine } from '../calculate';
import { LineInputError } from '../errors';
import type { LineResult, LineSpec } from '../types';
import { validateSpec } from '../validate-spec';
import { brentRoot } from './brent';
import { fieldDefault, fieldValue, type OutputQuantity, outputValue, requireNumericField, requireOutputQuantity, withField } from './numeric-fields';

export interface SolveTarget {
  /** The output to hit: 'z0', 'zDiff' (coupled kinds), 'delayPerMeter', 'erEff', … */
  quantity: OutputQuantity;
  /** Its wanted value, SI (Ω, s/m …). */
  value: number;
}

export interface SolveOptions {
  /** Lower end of the search range for the unknown, SI. Default: current value / 100 (1 for permittivities). */
  min?: number;
  /** Upper end. Default: current value × 100 (100 for permittivities). */
  max?: number;
  /** Stop when the unknown is known to this relative precision; default 1e-9. */
  relativeTolerance?: number;
}

export interface SolveResult<S extends LineSpec> {
  /** The unknown's value that hits the target, SI. */
  value: number;
  /** The input spec with the unknown filled in. */
  spec: S;
  /** calculate(spec) at the solution. */
  result: LineResult;
  /** Root-finder iterations after bracketing (the bracketing scan takes SCAN_POINTS more evaluations). */
  iterations: number;
}

/** Log-spaced points scanned to find a sign change; enough to separate the roots of any of the kinds' monotone outputs. */
const SCAN_POINTS = 41;
const DEFAULT_RANGE_FACTOR = 100;
const PERMITTIVITY_RANGE = [1, 100] as const;
const DEFAULT_RELATIVE_TOLERANCE = 1e-9;

/**
 * Finds the value of `unknown` (any numeric input of the kind: 'w', 's', 'h', 'er', …)
 * for which calculate(spec)[target.quantity] equals target.value.
 * The range [min, max] is scanned at SCAN_POINTS log-spaced points (inputs that are
 * impossible there, e.g. s ≤ d, are skipped), the first sign change is bracketed and
 * refined with Brent's method.
 * Throws LineInputError(unknown) when no value in the range reaches the target; the
 * message gives the reachable range of the output.
 */
export function solve<S extends LineSpec>(spec: S, unknown: string, target: SolveTarget, options: SolveOptions = {}): SolveResult<S> {
  requireNumericField(spec, unknown);
  requireOutputQuantity(target.quantity);
  if (!Number.isFinite(target.value)) throw new LineInputError('value', 'the target must be a finite number');
  const [min, max] = searchRange(spec, unknown, options);
  const needsLosses = target.quantity === 'lossDbPerMeter';
  const objective = (x: number): number => outputValue(calculateLine(withField(spec, unknown, x), needsLosses), target.quantity) - target.value;

  const ratio = Math.pow(max / min, 1 / (SCAN_POINTS - 1));
  let previous: { x: number; f: number } | undefined;
  let lowest = Infinity;
  let highest = -Infinity;
  for (let index = 0; index < SCAN_POINTS; index++) {
    const x = index === SCAN_POINTS - 1 ? max : min * Math.pow(ratio, index);
    const f = tryObjective(objective, x);
    if (f === undefined) continue;
    lowest = Math.min(lowest, f + target.value);
    highest = Math.max(highest, f + target.value);
    if (f === 0) return finish(spec, unknown, x, 0);
    if (previous && previous.f * f < 0) {
      const tolerance = (options.relativeTolerance ?? DEFAULT_RELATIVE_TOLERANCE) * Math.min(previous.x, x);
      const root = brentRoot(objective, previous.x, x, previous.f, f, tolerance);
      return finish(spec, unknown, root.x, root.iterations);
    }
    previous = { x, f };
  }
  const reach = lowest <= highest ? `reachable ${target.quantity} is ${lowest.toPrecision(4)} to ${highest.toPrecision(4)}` : 'no value in the range is a valid input';
  throw new LineInputError(unknown, `cannot reach ${target.quantity} = ${target.value} for ${unknown} in ${min.toPrecision(4)}…${max.toPrecision(4)}: ${reach}`);
}

function searchRange(spec: LineSpec, unknown: string, options: SolveOptions): [number, number] {
  const isPermittivity = unknown === 'er' || unknown === 'erCover';
  const current = fieldValue(spec, unknown) || fieldDefault(spec, unknown);
  const min = options.min ?? (isPermittivity ? PERMITTIVITY_RANGE[0] : current / DEFAULT_RANGE_FACTOR);
  const max = options.max ?? (isPermittivity ? PERMITTIVITY_RANGE[1] : current * DEFAULT_RANGE_FACTOR);
  if (!(min > 0 && Number.isFinite(min))) throw new LineInputError('min', 'must be a finite number greater than zero');
  if (!(max > min && Number.isFinite(max))) throw new LineInputError('max', 'must be a finite number greater than min');
  return [min, max];
}

/** The objective, or undefined where the input is impossible (skipped by the scan). */
function tryObjective(objective: (x: number) => number, x: number): number | undefined {
  try {
    return objective(x);
  } catch (error) {
    // Impossible inputs (e.g. d ≥ D) are expected at the ends of a wide range; anything else is a real failure.
    if (error instanceof LineInputError && error.field !== 'quantity') return undefined;
    throw error;
  }
}

function finish<S extends LineSpec>(spec: S, unknown: string, value: number, iterations: number): SolveResult<S> {
  const solved = withField(spec, unknown, value);
  validateSpec(solved);
  return { value, spec: solved, result: calculate(solved), iterations };
}
