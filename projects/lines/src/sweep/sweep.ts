/**
 * One input stepped across a range, for charts.
 */
import { calculate } from '../calculate';
import { LineInputError } from '../errors';
import { requireNumericField, withField } from '../solve/numeric-fields';
import type { LineResult, LineSpec } from '../types';
import { requireFinite } from '../validation';

export interface SweepOptions {
  /** 'linear' (default) or 'log' spacing of the points; log needs from, to > 0. */
  spacing?: 'linear' | 'log';
}

export interface SweepResult {
  /** The swept input, e.g. 'w' or 'frequency'. */
  field: string;
  /** Its values, SI, one per point. */
  x: number[];
  /** calculate() at each point. */
  results: LineResult[];
  /** The main outputs per point, ready for a chart (zDiff only for coupled kinds, loss only with a frequency). */
  series: { z0: number[]; erEff: number[]; delayPerMeter: number[]; zDiff?: number[]; lossDbPerMeter?: number[] };
}

const MIN_POINTS = 2;
const MAX_POINTS = 10_000;

/**
 * calculate() at `points` values of `field` from `from` to `to` (inclusive). `field`
 * is any numeric input of the kind, including 'frequency' and 'length'.
 * Throws LineInputError: 'points' outside 2…10 000, 'from'/'to' not finite, or the
 * swept field's own error when a point is an impossible input.
 */
export function sweep(spec: LineSpec, field: string, from: number, to: number, points: number, options: SweepOptions = {}): SweepResult {
  requireNumericField(spec, field);
  requireFinite('from', from);
  requireFinite('to', to);
  if (!Number.isInteger(points) || points < MIN_POINTS || points > MAX_POINTS) {
    throw new LineInputError('points', `must be a whole number from ${MIN_POINTS} to ${MAX_POINTS}`);
  }
  const isLog = options.spacing === 'log';
  if (isLog && !(from > 0 && to > 0)) throw new LineInputError('from', 'log spacing needs from and to greater than zero');
  const x = new Array<number>(points);
  const results = new Array<LineResult>(points);
  for (let index = 0; index < points; index++) {
    const fraction = index / (points - 1);
    x[index] = isLog ? from * Math.pow(to / from, fraction) : from + (to - from) * fraction;
    results[index] = calculate(withField(spec, field, x[index]));
  }
  const series: SweepResult['series'] = {
    z0: results.map((result) => result.z0),
    erEff: results.map((result) => result.erEff),
    delayPerMeter: results.map((result) => result.delayPerMeter),
  };
  if (results[0].zDiff !== undefined) series.zDiff = results.map((result) => result.zDiff!);
  if (results[0].lossDbPerMeter !== undefined) series.lossDbPerMeter = results.map((result) => result.lossDbPerMeter!);
  return { field, x, results, series };
}
