/**
 * Reading and replacing one numeric input of a spec by name, for solve, sweep
 * and tolerance. Only fields the kind declares (kindFields) are accepted.
 */
import { LineInputError } from '../errors';
import { kindFields } from '../kinds/registry';
import type { LineResult, LineSpec } from '../types';

/** Outputs that solve can aim at and sweep/tolerance can report. */
export type OutputQuantity = 'z0' | 'zDiff' | 'zOdd' | 'zEven' | 'zCommon' | 'erEff' | 'delayPerMeter' | 'velocityFactor' | 'lossDbPerMeter';

const OUTPUT_QUANTITIES: readonly OutputQuantity[] = ['z0', 'zDiff', 'zOdd', 'zEven', 'zCommon', 'erEff', 'delayPerMeter', 'velocityFactor', 'lossDbPerMeter'];

/** Throws LineInputError(`field`) unless `name` is a numeric input of the spec's kind. */
export function requireNumericField(spec: LineSpec, name: string, field = name): void {
  const description = kindFields(spec.kind).find((entry) => entry.name === name);
  if (!description || description.quantity === 'boolean') {
    const names = kindFields(spec.kind).filter((entry) => entry.quantity !== 'boolean').map((entry) => entry.name);
    throw new LineInputError(field, `must be a numeric input of ${spec.kind}: ${names.join(', ')}`);
  }
}

/** The spec with `name` set to `value` (a shallow copy). */
export function withField<S extends LineSpec>(spec: S, name: string, value: number): S {
  return { ...spec, [name]: value };
}

/** The current value of a numeric field, or undefined when the spec omits it. */
export function fieldValue(spec: LineSpec, name: string): number | undefined {
  const value = (spec as unknown as Record<string, unknown>)[name];
  return typeof value === 'number' ? value : undefined;
}

/** The kind's default for a field (used when the spec omits it). */
export function fieldDefault(spec: LineSpec, name: string): number {
  const value = kindFields(spec.kind).find((entry) => entry.name === name)?.defaultValue;
  return typeof value === 'number' ? value : 1;
}

/** Throws LineInputError('quantity') unless `quantity` is a known output. */
export function requireOutputQuantity(quantity: string): asserts quantity is OutputQuantity {
  if (!(OUTPUT_QUANTITIES as readonly string[]).includes(quantity)) {
    throw new LineInputError('quantity', `must be one of ${OUTPUT_QUANTITIES.join(', ')}`);
  }
}

/** Reads an output; throws LineInputError('quantity') when this spec does not produce it (e.g. zDiff of a single line). */
export function outputValue(result: LineResult, quantity: OutputQuantity): number {
  const value = result[quantity];
  if (value === undefined) throw new LineInputError('quantity', `${quantity} is not an output of this line (coupled kinds give zDiff…, a frequency gives losses)`);
  return value;
}
