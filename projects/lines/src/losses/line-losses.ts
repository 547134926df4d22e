/**
 * The frequency-dependent outputs of calculate(): skin depth, conductor and
 * dielectric attenuation, RLGC per metre and the complex impedance.
 */
import { DB_PER_NEPER, COPPER_CONDUCTIVITY } from '../constants';
import type { LineModel, ModelOutput } from '../kinds/line-model';
import { complexDivide, complexSqrt } from '../math/complex';
import type { LineResult, LineSpec } from '../types';
import { conductorAttenuation } from './conductor-loss';
import { dielectricAttenuation } from './dielectric-loss';
import { hammerstadBekkadalFactor, hurayFactor } from './roughness';
import { skinDepth, surfaceResistance } from './skin-effect';

/** The incremental-inductance rule wants conductors thicker than this many skin depths. */
const THICK_CONDUCTOR_SKIN_DEPTHS = 3;

/** Roughness factor chosen by `spec.roughnessModel` (validated before). */
function roughnessFactor(spec: LineSpec, delta: number): number {
  if (spec.roughnessModel === 'huray') return hurayFactor(delta, spec.noduleRadius!, spec.noduleSurfaceRatio!);
  return spec.roughness ? hammerstadBekkadalFactor(spec.roughness, delta) : 1;
}

/** Smallest non-zero geometry length of the spec: the scale of the conductor-loss derivative. */
function smallestLength<S extends LineSpec>(model: LineModel<S>, spec: S): number {
  let smallest = Infinity;
  for (const field of model.fields) {
    const value = (spec as unknown as Record<string, unknown>)[field.name];
    if (field.isLength && field.group === 'geometry' && typeof value === 'number' && value > 0 && value < smallest) smallest = value;
  }
  return smallest;
}

/**
 * Fills the loss outputs of `result` at `spec.frequency`. `spec.er` and `tanDelta`
 * are the values at that frequency; `line` is the model output already in `result`.
 * For coupled kinds every figure is the odd (differential) mode's.
 */
export function addLosses<S extends LineSpec>(result: LineResult, model: LineModel<S>, spec: S, line: ModelOutput, tanDelta: number): void {
  const frequency = spec.frequency!;
  const conductivity = spec.conductivity ?? COPPER_CONDUCTIVITY;
  const delta = skinDepth(frequency, conductivity);
  const rs = surfaceResistance(frequency, conductivity) * roughnessFactor(spec, delta);
  const thickness = (spec as { t?: number }).t;
  if (thickness === 0) {
    result.warnings.push('t = 0: conductor loss needs a real strip thickness; the strip edges are left out of it.');
  } else if (thickness !== undefined && thickness < THICK_CONDUCTOR_SKIN_DEPTHS * delta) {
    result.warnings.push(`t is less than ${THICK_CONDUCTOR_SKIN_DEPTHS} skin depths: the incremental-inductance rule understates the conductor loss.`);
  }
  const alphaConductor = conductorAttenuation(model, spec, line, rs, smallestLength(model, spec)).main;
  const alphaDielectric = dielectricAttenuation(frequency, spec.er, result.erEff, tanDelta);
  const z = model.isCoupled ? line.zOdd! : result.z0;
  const omega = 2 * Math.PI * frequency;
  const rPerMeter = 2 * z * alphaConductor;
  const gPerMeter = (2 * alphaDielectric) / z;
  const ratio = complexDivide(rPerMeter, omega * result.lPerMeter, gPerMeter, omega * result.cPerMeter);
  result.skinDepth = delta;
  result.alphaConductor = alphaConductor;
  result.alphaDielectric = alphaDielectric;
  result.lossDbPerMeter = DB_PER_NEPER * (alphaConductor + alphaDielectric);
  result.rPerMeter = rPerMeter;
  result.gPerMeter = gPerMeter;
  result.zc = complexSqrt(ratio);
}
