/**
 * The coarsest grid of the refinement sequence, its cell sizes set from the
 * section itself: fine at conductor corners (a tenth of the smallest gap
 * between required lines in the features, but not below 1/1000 of the
 * section), a quarter of the radius across round wires (smooth boundaries need
 * no grading), at most 1/12 of the section inside the features, and growing by
 * 1.4 per cell away from all of them. The shares were tuned on the cases of
 * test/lines/field for the fewest cells at the default tolerance (common
 * practice, no source). A section whose required lines are mirror-symmetric
 * gets mirror-symmetric grid lines, so that symmetry can be detected exactly.
 */
import type { DirectionLines, SolverDomain } from './domain';
import { baseLines, type GradingRule, uniqueSorted } from './grid-lines';

/** Fine cell size as a share of the smallest feature gap. */
const CORNER_SHARE = 1 / 10;
/** Bounds on the fine cell size, as shares of the section size. */
const FINEST_SHARE = 1 / 1000;
const COARSEST_FINE_SHARE = 1 / 20;
/** Cell size across a round wire, as a share of its radius. */
const WIRE_SHARE = 1 / 4;
/** Largest cell inside the features, as a share of the section size. */
const FEATURE_SHARE = 1 / 12;
/** Ratio of neighbouring cell sizes. */
const GROWTH = 1.4;

export interface BaseGrid {
  xs: number[];
  ys: number[];
}

/** The base grid covering the whole domain. */
export function baseGrid(domain: SolverDomain): BaseGrid {
  const { box, feature, size, tolerance } = domain;
  const fine = Math.min(COARSEST_FINE_SHARE * size, Math.max(FINEST_SHARE * size, CORNER_SHARE * smallestGap(domain)));
  const rule = (lines: DirectionLines, start: number, end: number): GradingRule => ({
    growth: GROWTH,
    zones: [
      { start, end, size: FEATURE_SHARE * size },
      ...lines.corners.map((corner) => ({ start: corner, end: corner, size: fine })),
      ...lines.wires.map((wire) => ({ ...wire, size: (WIRE_SHARE * (wire.end - wire.start)) / 2 })),
    ],
  });
  const ys = baseLines(box.bottom, box.top, required(domain.y), rule(domain.y, feature.bottom, feature.top), tolerance);
  return { xs: symmetricLines(domain, rule(domain.x, feature.left, feature.right)), ys };
}

function required(lines: DirectionLines): number[] {
  return [...lines.aligned, ...lines.corners];
}

/** x lines: built on the right half and mirrored when everything that shapes them allows it, so mirror images match to the last bit. */
function symmetricLines(domain: SolverDomain, rule: GradingRule): number[] {
  const { box, axis, tolerance } = domain;
  const lines = required(domain.x);
  const wireEnds = domain.x.wires.flatMap((wire) => [wire.start, wire.end]);
  if (![lines, domain.x.corners, wireEnds].every((set) => isMirrorSymmetric(set, axis, tolerance))) {
    return baseLines(box.left, box.right, lines, rule, tolerance);
  }
  const right = baseLines(axis, box.right, lines, rule, tolerance);
  const left = right
    .slice(1)
    .map((x) => 2 * axis - x)
    .reverse();
  return [...left, ...right];
}

function isMirrorSymmetric(lines: number[], axis: number, tolerance: number): boolean {
  const sorted = uniqueSorted(lines, tolerance);
  const mirrored = uniqueSorted(
    lines.map((x) => 2 * axis - x),
    tolerance,
  );
  return sorted.length === mirrored.length && sorted.every((x, i) => Math.abs(x - mirrored[i]!) <= 2 * tolerance);
}

/** The smallest distance between two distinct required lines inside the features, over both directions. */
function smallestGap(domain: SolverDomain): number {
  const { feature, tolerance } = domain;
  const gap = (lines: DirectionLines, start: number, end: number): number => {
    const inside = uniqueSorted(
      required(lines).filter((value) => value >= start - tolerance && value <= end + tolerance),
      tolerance,
    );
    let smallest = Infinity;
    for (let i = 1; i < inside.length; i++) smallest = Math.min(smallest, inside[i]! - inside[i - 1]!);
    return smallest;
  };
  return Math.min(gap(domain.x, feature.left, feature.right), gap(domain.y, feature.bottom, feature.top), domain.size);
}
