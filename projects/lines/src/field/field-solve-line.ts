/**
 * "Check with the field solver": a LineSpec through crossSectionFromSpec and
 * fieldSolve, reported in the same terms as calculate(spec).
 */
import type { LineSpec } from '../types';
import { crossSectionFromSpec, type CrossSectionOptions } from './cross-section-from-spec';
import { fieldSolve, type FieldSolveOptions, type FieldSolveResult } from './field-solve';

export interface FieldLineResult {
  /** As calculate(): the line's Z0; for a wire pair the impedance between the wires; for a coupled pair √(zOdd·zEven) [Ω]. */
  z0: number;
  /** As calculate(): for pairs the odd (differential) mode's. */
  erEff: number;
  zOdd?: number;
  zEven?: number;
  zDiff?: number;
  zCommon?: number;
  estimatedError: number;
  cells: number;
  warnings: string[];
  /** Everything the solver returned: matrices, levels, potential map. */
  solution: FieldSolveResult;
}

const WIRE_PAIRS: readonly LineSpec['kind'][] = ['twin-lead', 'twisted-pair'];

export interface FieldSolveLineOptions extends FieldSolveOptions {
  /** Departures from the idealised section: etched trapezoid strips, a coating, a different εr above a buried strip. */
  section?: CrossSectionOptions;
}

/** Solves the cross-section of `spec`; throws LineInputError for impossible input, like calculate(). */
export async function fieldSolveLine(spec: LineSpec, options: FieldSolveLineOptions = {}): Promise<FieldLineResult> {
  const { section, ...solveOptions } = options;
  const solution = await fieldSolve(crossSectionFromSpec(spec, section), solveOptions);
  const warnings = [...solution.warnings];
  if (spec.kind === 'twisted-pair') warnings.push('the twist is not modelled: the field solution is the untwisted pair of touching insulated wires');
  const common = { estimatedError: solution.estimatedError, cells: solution.cells, warnings, solution };
  if (WIRE_PAIRS.includes(spec.kind)) return { z0: solution.zDiff!, erEff: solution.erEffOdd!, ...common };
  return {
    z0: solution.z0,
    erEff: solution.erEff,
    zOdd: solution.zOdd,
    zEven: solution.zEven,
    zDiff: solution.zDiff,
    zCommon: solution.zCommon,
    ...common,
  };
}
