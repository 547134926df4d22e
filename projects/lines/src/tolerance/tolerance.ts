/**
 * Fabrication tolerance: how z0 (zDiff for pairs) and delay spread when the
 * inputs vary within ± limits.
 */
import { calculate, calculateLine } from '../calculate';
import { LineInputError } from '../errors';
import { fieldValue, requireNumericField, withField } from '../solve/numeric-fields';
import type { LineResult, LineSpec } from '../types';
import { validateSpec } from '../validate-spec';
import { normalStream, uniformStream } from './random-stream';
import { sampleStatistics, type SampleStatistics } from './statistics';

/**
 * The ± limit of one input. Give `plusMinus` (absolute, SI: e.g. 0.0000254 for ±1 mil)
 * or `plusMinusRelative` (fraction: 0.05 for ±5 %). `distribution` 'uniform' (default)
 * spreads samples evenly inside the limits; 'normal' treats the limit as 3σ (common practice, no source).
 */
export interface Spread {
  plusMinus?: number;
  plusMinusRelative?: number;
  distribution?: 'uniform' | 'normal';
}

/** Spreads by input name, e.g. { w: { plusMinus: 25.4e-6 }, er: { plusMinusRelative: 0.05 } }. */
export type Spreads = Record<string, Spread>;

export interface ToleranceOptions {
  /** Start of the random stream: the same number gives the same samples. Default 1. */
  randomState?: number;
  /** Histogram bins; default 20. */
  bins?: number;
}

export interface Corner {
  value: number;
  /** The input values at this corner, by name. */
  inputs: Record<string, number>;
}

export interface Sensitivity {
  field: string;
  /** ∂impedance/∂input [Ω per SI unit of the input]. */
  impedancePerUnit: number;
  /** ∂delayPerMeter/∂input [s/m per SI unit]. */
  delayPerUnit: number;
  /** Impedance change for the input at +limit, to first order [Ω]. */
  impedanceSwing: number;
}

export interface ToleranceResult {
  /** 'z0', or 'zDiff' for coupled kinds. */
  impedanceQuantity: 'z0' | 'zDiff';
  nominal: LineResult;
  /** Samples computed (impossible draws, e.g. a negative width from a wide normal spread, are not counted). */
  samples: number;
  rejected: number;
  impedance: SampleStatistics;
  delayPerMeter: SampleStatistics;
  /** Worst-case corners: every input at one end of its limit. */
  corners: { impedanceLow: Corner; impedanceHigh: Corner; delayLow: Corner; delayHigh: Corner };
  sensitivities: Sensitivity[];
}

const MAX_SAMPLES = 100_000;
/** Up to this many spread inputs every corner is evaluated (2^n); beyond it, the corners follow the sensitivities' signs. */
const MAX_FULL_CORNER_INPUTS = 8;
/** Central-difference step for the sensitivities, relative to the limit. */
const DERIVATIVE_STEP = 1e-3;
const DEFAULT_BINS = 20;

interface Limit {
  field: string;
  nominal: number;
  limit: number;
  isNormal: boolean;
}

/**
 * Monte Carlo statistics, worst-case corners and first-order sensitivities of the
 * impedance (z0, or zDiff for coupled kinds) and delayPerMeter under ± limits.
 * Throws LineInputError for an unknown or omitted input, a bad limit, samples outside
 * 1…100 000, or a nominal spec that is itself impossible.
 */
export function tolerance(spec: LineSpec, spreads: Spreads, samples: number, options: ToleranceOptions = {}): ToleranceResult {
  validateSpec(spec);
  if (!Number.isInteger(samples) || samples < 1 || samples > MAX_SAMPLES) throw new LineInputError('samples', `must be a whole number from 1 to ${MAX_SAMPLES}`);
  const bins = options.bins ?? DEFAULT_BINS;
  if (!Number.isInteger(bins) || bins < 1) throw new LineInputError('bins', 'must be a whole number of at least 1');
  const limits = Object.entries(spreads).map(([field, spread]) => readLimit(spec, field, spread));
  const nominal = calculate(spec);
  const impedanceQuantity = nominal.zDiff === undefined ? 'z0' : 'zDiff';
  const impedanceOf = (result: LineResult): number => result[impedanceQuantity]!;

  const uniform = uniformStream(options.randomState ?? 1);
  const normal = normalStream(uniform);
  const impedances = new Float64Array(samples);
  const delays = new Float64Array(samples);
  let count = 0;
  for (let index = 0; index < samples; index++) {
    const draw: Record<string, unknown> = { ...spec };
    for (const limit of limits) {
      const offset = limit.isNormal ? (normal() * limit.limit) / 3 : (2 * uniform() - 1) * limit.limit;
      draw[limit.field] = limit.nominal + offset;
    }
    const result = tryCalculate(draw as unknown as LineSpec);
    if (!result) continue;
    impedances[count] = impedanceOf(result);
    delays[count] = result.delayPerMeter;
    count++;
  }
  if (count === 0) throw new LineInputError('spreads', 'every sample was an impossible input; narrow the limits');

  const sensitivities = limits.map((limit) => sensitivity(spec, limit, impedanceOf));
  return {
    impedanceQuantity,
    nominal,
    samples: count,
    rejected: samples - count,
    impedance: sampleStatistics(impedances, count, bins),
    delayPerMeter: sampleStatistics(delays, count, bins),
    corners: worstCorners(spec, limits, sensitivities, impedanceOf),
    sensitivities,
  };
}

function readLimit(spec: LineSpec, field: string, spread: Spread): Limit {
  requireNumericField(spec, field, `spreads.${field}`);
  const nominal = fieldValue(spec, field);
  if (nominal === undefined) throw new LineInputError(`spreads.${field}`, 'the spec has no value for this input');
  const hasAbsolute = spread.plusMinus !== undefined;
  if (hasAbsolute === (spread.plusMinusRelative !== undefined)) throw new LineInputError(`spreads.${field}`, 'give exactly one of plusMinus and plusMinusRelative');
  const limit = hasAbsolute ? spread.plusMinus! : spread.plusMinusRelative! * Math.abs(nominal);
  if (!(limit >= 0 && Number.isFinite(limit))) throw new LineInputError(`spreads.${field}`, 'the limit must be a finite number ≥ 0');
  if (spread.distribution !== undefined && spread.distribution !== 'uniform' && spread.distribution !== 'normal') {
    throw new LineInputError(`spreads.${field}`, 'distribution must be uniform or normal');
  }
  return { field, nominal, limit, isNormal: spread.distribution === 'normal' };
}

function tryCalculate(spec: LineSpec): LineResult | undefined {
  try {
    return calculateLine(spec, false);
  } catch (error) {
    // A draw can be physically impossible (e.g. s ≤ d at the edge of wide limits): it is skipped and counted.
    if (error instanceof LineInputError) return undefined;
    throw error;
  }
}

function sensitivity(spec: LineSpec, limit: Limit, impedanceOf: (result: LineResult) => number): Sensitivity {
  const step = DERIVATIVE_STEP * (limit.limit || Math.abs(limit.nominal) || 1);
  const up = calculateLine(withField(spec, limit.field, limit.nominal + step), false);
  const down = calculateLine(withField(spec, limit.field, limit.nominal - step), false);
  const impedancePerUnit = (impedanceOf(up) - impedanceOf(down)) / (2 * step);
  return {
    field: limit.field,
    impedancePerUnit,
    delayPerUnit: (up.delayPerMeter - down.delayPerMeter) / (2 * step),
    impedanceSwing: impedancePerUnit * limit.limit,
  };
}

function worstCorners(spec: LineSpec, limits: Limit[], sensitivities: Sensitivity[], impedanceOf: (result: LineResult) => number): ToleranceResult['corners'] {
  const signSets: number[][] = [];
  if (limits.length <= MAX_FULL_CORNER_INPUTS) {
    for (let mask = 0; mask < 1 << limits.length; mask++) signSets.push(limits.map((_, index) => ((mask >> index) & 1 ? 1 : -1)));
  } else {
    signSets.push(sensitivities.map((entry) => Math.sign(entry.impedancePerUnit) || 1), sensitivities.map((entry) => -(Math.sign(entry.impedancePerUnit) || 1)));
    signSets.push(sensitivities.map((entry) => Math.sign(entry.delayPerUnit) || 1), sensitivities.map((entry) => -(Math.sign(entry.delayPerUnit) || 1)));
  }
  const nominal = calculateLine(spec, false);
  const start: Corner = { value: impedanceOf(nominal), inputs: {} };
  const corners = { impedanceLow: start, impedanceHigh: start, delayLow: { ...start, value: nominal.delayPerMeter }, delayHigh: { ...start, value: nominal.delayPerMeter } };
  for (const signs of signSets) {
    const inputs: Record<string, number> = {};
    limits.forEach((limit, index) => (inputs[limit.field] = limit.nominal + signs[index] * limit.limit));
    const result = tryCalculate({ ...spec, ...inputs } as LineSpec);
    if (!result) continue;
    const impedance = impedanceOf(result);
    if (impedance < corners.impedanceLow.value) corners.impedanceLow = { value: impedance, inputs };
    if (impedance > corners.impedanceHigh.value) corners.impedanceHigh = { value: impedance, inputs };
    if (result.delayPerMeter < corners.delayLow.value) corners.delayLow = { value: result.delayPerMeter, inputs };
    if (result.delayPerMeter > corners.delayHigh.value) corners.delayHigh = { value: result.delayPerMeter, inputs };
  }
  return corners;
}
