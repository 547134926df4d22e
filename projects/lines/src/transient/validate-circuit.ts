/**
 * Input rules for stepResponse(): impossible input throws LineInputError with
 * the field's path from the circuit's root ('source.riseTime', 'line.delay',
 * 'options.points'), so the API can point at it.
 */
import { LineInputError } from '../errors';
import { requireFinite, requireNonNegative, requirePositive } from '../validation';
import type { StepCircuit, StepOptions, TransientLoad, TransientMethod } from './circuit';
import { edgeSigma } from './edge';
import { lineTransfer, type LineTransfer } from './line-transfer';

/** Default settling band: 2 % of the final value. */
export const DEFAULT_BAND = 0.02;
export const DEFAULT_POINTS = 4096;
export const MIN_POINTS = 16;
/** 2¹⁶ samples: beyond this a response costs more memory and time than any screen or API answer needs. */
export const MAX_POINTS = 65_536;

/** A load reduced to numbers: resistance Infinity is open, 0 is short. */
export interface NormalizedLoad {
  resistance: number;
  capacitance: number;
  seriesRc: { resistance: number; capacitance: number } | null;
}

export interface NormalizedCircuit {
  amplitude: number;
  sourceResistance: number;
  riseTime: number;
  /** Gaussian σ of the edge [s] (edge.ts). */
  sigma: number;
  line: LineTransfer;
  load: NormalizedLoad;
}

export interface NormalizedOptions {
  duration: number | undefined;
  band: number;
  points: number;
  method: TransientMethod | undefined;
}

/** True when the load has no reactive part, so the lattice applies (with a lossless line). */
export const isResistiveLoad = (load: NormalizedLoad): boolean => load.capacitance === 0 && load.seriesRc === null;

export function normalizeCircuit(circuit: StepCircuit): NormalizedCircuit {
  if (typeof circuit !== 'object' || circuit === null) throw new LineInputError('circuit', 'must be an object');
  const { source } = circuit;
  if (typeof source !== 'object' || source === null) throw new LineInputError('source', 'must be an object');
  requireFinite('source.amplitude', source.amplitude);
  requireNonNegative('source.resistance', source.resistance);
  requireNonNegative('source.riseTime', source.riseTime);
  const line = lineTransfer(circuit.line, source.riseTime);
  const load = normalizeLoad(circuit.load);
  if (source.resistance + line.dcResistance === 0 && load.resistance === 0) {
    throw new LineInputError('load', 'a short circuit driven through zero resistance has no finite final current');
  }
  return {
    amplitude: source.amplitude,
    sourceResistance: source.resistance,
    riseTime: source.riseTime,
    sigma: edgeSigma(source.riseTime),
    line,
    load,
  };
}

function normalizeLoad(load: TransientLoad): NormalizedLoad {
  if (load === 'open') return { resistance: Infinity, capacitance: 0, seriesRc: null };
  if (load === 'short') return { resistance: 0, capacitance: 0, seriesRc: null };
  if (typeof load !== 'object' || load === null) {
    throw new LineInputError('load', "must be 'open', 'short' or { resistance?, capacitance? }");
  }
  const resistance = load.resistance ?? Infinity;
  if (load.resistance !== undefined) requireNonNegative('load.resistance', load.resistance);
  const capacitance = load.capacitance ?? 0;
  requireNonNegative('load.capacitance', capacitance);
  let seriesRc: NormalizedLoad['seriesRc'] = null;
  if (load.seriesRc !== undefined) {
    requireNonNegative('load.seriesRc.resistance', load.seriesRc.resistance);
    requirePositive('load.seriesRc.capacitance', load.seriesRc.capacitance);
    seriesRc = { resistance: load.seriesRc.resistance, capacitance: load.seriesRc.capacitance };
  }
  // A short in parallel makes any capacitance irrelevant; keep the lattice path for it.
  if (resistance === 0) return { resistance: 0, capacitance: 0, seriesRc: null };
  return { resistance, capacitance, seriesRc };
}

export function normalizeOptions(options: StepOptions = {}): NormalizedOptions {
  if (typeof options !== 'object' || options === null) throw new LineInputError('options', 'must be an object');
  const { duration, method } = options;
  if (duration !== undefined) requirePositive('options.duration', duration);
  const band = options.band ?? DEFAULT_BAND;
  requirePositive('options.band', band);
  if (band >= 1) throw new LineInputError('options.band', 'must be less than 1 (it is a fraction of the final value)');
  const points = options.points ?? DEFAULT_POINTS;
  requireFinite('options.points', points);
  if (!Number.isInteger(points) || points < MIN_POINTS || points > MAX_POINTS) {
    throw new LineInputError('options.points', `must be a whole number from ${MIN_POINTS} to ${MAX_POINTS}`);
  }
  if (method !== undefined && method !== 'lattice' && method !== 'frequency-domain') {
    throw new LineInputError('options.method', "must be 'lattice' or 'frequency-domain'");
  }
  return { duration, band, points, method };
}
