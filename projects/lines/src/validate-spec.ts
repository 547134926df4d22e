/**
 * Checks a spec before anything is computed, so the API can answer with the
 * typed error first. calculate() calls it too.
 */
import { LineInputError } from './errors';
import type { LineModel } from './kinds/line-model';
import { lineModel } from './kinds/registry';
import type { LineSpec } from './types';
import { requireAtLeast, requireNonNegative, requirePositive } from './validation';

/**
 * Throws LineInputError (field and rule) for impossible input: an unknown kind or
 * method, a missing or non-finite number, zero or negative sizes, er < 1, and each
 * kind's geometry rules (D > d, s > d, t < b …). Returns the kind's model.
 */
export function validateSpec<S extends LineSpec>(spec: S): LineModel<S> {
  if (typeof spec !== 'object' || spec === null) throw new LineInputError('kind', 'a line spec object is required');
  const model = lineModel<S>(spec.kind);
  requireAtLeast('er', spec.er, 1);
  if (spec.tanDelta !== undefined) requireNonNegative('tanDelta', spec.tanDelta);
  if (spec.frequency !== undefined) requirePositive('frequency', spec.frequency);
  if (spec.length !== undefined) requireNonNegative('length', spec.length);
  if (spec.conductivity !== undefined) requirePositive('conductivity', spec.conductivity);
  if (spec.roughness !== undefined) requireNonNegative('roughness', spec.roughness);
  if (spec.dielectricReferenceFrequency !== undefined) requirePositive('dielectricReferenceFrequency', spec.dielectricReferenceFrequency);
  validateRoughnessModel(spec);
  if (spec.method !== undefined && !model.methods.some((method) => method.id === spec.method)) {
    throw new LineInputError('method', `must be one of ${model.methods.map((method) => method.id).join(', ')}`);
  }
  model.validate(spec);
  return model;
}

function validateRoughnessModel(spec: LineSpec): void {
  if (spec.roughnessModel === undefined || spec.roughnessModel === 'hammerstad-bekkadal') return;
  if (spec.roughnessModel !== 'huray') throw new LineInputError('roughnessModel', 'must be hammerstad-bekkadal or huray');
  requirePositive('noduleRadius', spec.noduleRadius);
  requireNonNegative('noduleSurfaceRatio', spec.noduleSurfaceRatio);
}
