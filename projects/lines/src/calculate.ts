/**
 * The library's main entry: one line spec in, every output out.
 */
import { SPEED_OF_LIGHT } from './constants';
import { djordjevicSarkar } from './dielectric/djordjevic-sarkar';
import { addLosses } from './losses/line-losses';
import type { LineResult, LineSpec } from './types';
import { validateSpec } from './validate-spec';

/**
 * Impedance, propagation and (with `frequency`) loss of one transmission line.
 * Throws LineInputError for impossible input (see validateSpec); input outside a
 * method's validity computes and adds a warning. All quantities SI.
 * For coupled kinds, z0 = √(zOdd·zEven) and erEff, delay, L, C and the losses
 * describe the odd (differential) mode.
 */
export function calculate(spec: LineSpec): LineResult {
  return calculateLine(spec, true);
}

/**
 * calculate() with the loss outputs optional: tolerance and solve, which need only
 * impedance and delay, skip the conductor-loss derivative (three times the work).
 */
export function calculateLine(spec: LineSpec, includeLosses: boolean): LineResult {
  const model = validateSpec(spec);
  let tanDelta = spec.tanDelta ?? 0;
  let lineSpec = spec;
  let dispersive: { er: number; tanDelta: number } | undefined;
  if (spec.frequency !== undefined && spec.dielectricReferenceFrequency !== undefined) {
    dispersive = djordjevicSarkar(spec.er, tanDelta, spec.dielectricReferenceFrequency, spec.frequency);
    tanDelta = dispersive.tanDelta;
    lineSpec = { ...spec, er: Math.max(1, dispersive.er) };
  }
  const line = model.compute(lineSpec);
  const erEff = line.erEffOdd ?? line.erEff;
  const zMode = line.zOdd ?? line.z0;
  const root = Math.sqrt(erEff);
  const result: LineResult = {
    z0: line.z0,
    erEff,
    delayPerMeter: root / SPEED_OF_LIGHT,
    velocityFactor: 1 / root,
    lPerMeter: (zMode * root) / SPEED_OF_LIGHT,
    cPerMeter: root / (zMode * SPEED_OF_LIGHT),
    method: line.method,
    warnings: line.warnings,
    ...line.extras,
  };
  if (line.zOdd !== undefined && line.zEven !== undefined) {
    result.zOdd = line.zOdd;
    result.zEven = line.zEven;
    result.zDiff = 2 * line.zOdd;
    result.zCommon = line.zEven / 2;
    result.erEffOdd = line.erEffOdd;
    result.erEffEven = line.erEffEven;
  }
  if (dispersive) {
    result.erAtFrequency = lineSpec.er;
    result.tanDeltaAtFrequency = tanDelta;
  }
  if (includeLosses && spec.frequency !== undefined) addLosses(result, model, lineSpec, line, tanDelta);
  if (spec.length !== undefined) addTotals(result, spec.length, includeLosses ? spec.frequency : undefined);
  assertFinite(result);
  return result;
}

function addTotals(result: LineResult, length: number, frequency: number | undefined): void {
  result.delay = result.delayPerMeter * length;
  if (frequency === undefined) return;
  result.lossDb = result.lossDbPerMeter! * length;
  result.electricalLengthDeg = 360 * frequency * result.delay;
}

/** The contract is "never a silent NaN": a non-finite output is a bug, so say which. */
function assertFinite(result: LineResult): void {
  for (const key in result) {
    const value = result[key as keyof LineResult];
    if (typeof value === 'number' && !Number.isFinite(value)) throw new Error(`internal: ${key} is not finite`);
  }
}
