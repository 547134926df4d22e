/**
 * The width (or, for a pair, the gap) that gives a line on a stackup layer its
 * target impedance: the stack fixes everything else.
 */
import { solve } from '../solve/solve';
import type { LineResult } from '../types';
import { requirePositive } from '../validation';
import { type LineDimensions, lineGeometryFor, type LineStructure, type LineUse, type StackupLineGeometry } from './line-geometry-for';
import type { Stackup } from './stackup';

export interface SolvedLineDimension {
  /** The solved width or gap [m]. */
  value: number;
  dimensions: LineDimensions;
  /** The geometry at the solution (its spec carries the solved value). */
  geometry: StackupLineGeometry;
  result: LineResult;
}

/** Start width when none is given: twice the nearer reference height, near 50 Ω for FR-4 microstrip (common practice, no source). */
const START_WIDTH_PER_HEIGHT = 2;

/**
 * Solves `unknown` ('width', or 'gap' for a pair) so that z0 (single) or zDiff
 * (pair) equals `impedance` [Ω]; the other dimension comes from `dimensions`
 * (the unknown's own value there is only the starting point and may be omitted).
 * Throws LineInputError naming the unknown's spec field ('w' or 's') when the target is out of reach.
 */
export function solveLineDimension(
  stackup: Stackup,
  layerIndex: number,
  structure: LineStructure,
  impedance: number,
  dimensions: Partial<LineDimensions>,
  unknown: 'width' | 'gap' = 'width',
  use: LineUse = {},
): SolvedLineDimension {
  requirePositive('impedance', impedance);
  const width = dimensions.width ?? startWidth(stackup, layerIndex, structure, dimensions.gap);
  // A gap solve starts from a gap equal to the width.
  const start = { width, gap: dimensions.gap ?? (unknown === 'gap' ? width : undefined) };
  const geometry = lineGeometryFor(stackup, layerIndex, structure, start, use);
  const field = unknown === 'gap' ? 's' : 'w';
  const solved = solve(geometry.spec, field, { quantity: structure === 'pair' ? 'zDiff' : 'z0', value: impedance });
  const solvedDimensions = unknown === 'gap' ? { ...start, gap: solved.value } : { ...start, width: solved.value };
  return {
    value: solved.value,
    dimensions: solvedDimensions,
    geometry: { ...geometry, spec: solved.spec },
    result: solved.result,
  };
}

function startWidth(stackup: Stackup, layerIndex: number, structure: LineStructure, gap: number | undefined): number {
  const probe = lineGeometryFor(stackup, layerIndex, structure, { width: 1, gap: gap ?? 1 });
  return START_WIDTH_PER_HEIGHT * Math.min(...probe.referenceHeights);
}
