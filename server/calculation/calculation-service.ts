import { ESTIMATE_NOTE, calculate, type LineResult, type LineSpec } from '@linewright/lines';
import { specToSi, withFieldPath } from './spec-units';

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
