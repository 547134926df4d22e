/**
 * A line type's geometry: the kind's geometry fields only (the library's
 * field group 'geometry'); Dk, Df, frequency, conductor and length come from
 * the material, the conductor and the line type's own default length.
 */
import { calculate, kindFields, type FieldDescription, type LineKind, type LineSpec } from '@linewright/lines';
import type { LineTarget, LineTypeInput } from './catalog-types';

export function geometryFields(kind: LineKind): FieldDescription[] {
  return kindFields(kind).filter((field) => field.group === 'geometry');
}

/** The geometry part of a calculator spec, SI. */
export function geometryOf(spec: LineSpec): Record<string, number | boolean> {
  const values = spec as unknown as Record<string, number | boolean | undefined>;
  const geometry: Record<string, number | boolean> = {};
  for (const field of geometryFields(spec.kind)) {
    const value = values[field.name];
    if (value !== undefined) geometry[field.name] = value;
  }
  return geometry;
}

/** Default tolerance of a saved target: ±10 % is the usual fabricator offer (common practice, no source). */
export const DEFAULT_TOLERANCE_PERCENT = 10;

/** A target from the line as it stands: its z0, or zDiff for a pair, rounded to 0.1 Ω. */
export function targetOf(spec: LineSpec): LineTarget | undefined {
  try {
    const result = calculate(spec);
    const quantity = result.zDiff === undefined ? 'z0' : 'zDiff';
    return { quantity, value: Math.round(result[quantity]! * 10) / 10, tolerancePercent: DEFAULT_TOLERANCE_PERCENT };
  } catch {
    // An incomplete calculator line has no target to suggest; the person types one.
    return undefined;
  }
}

/** A new line type's starting values from a calculator line (`er` kept only to compare with the chosen material). */
export function draftFromSpec(spec: LineSpec): Partial<LineTypeInput> & { er: number } {
  return {
    kind: spec.kind,
    geometry: geometryOf(spec),
    target: targetOf(spec),
    lengthDefault: spec.length ?? null,
    tags: [],
    er: spec.er,
  };
}
