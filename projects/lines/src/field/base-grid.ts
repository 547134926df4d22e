/**
 * The coarsest grid of the refinement sequence. Cell sizes are set from the
 * section itself: fine at conductor corners (a third of the smallest gap
 * between required lines in the features, but not below 1/300 of the section),
 * at most 1/12 of the section inside the features, growing by 1.5 per cell
 * away from both. A section whose required lines are mirror-symmetric gets
 * mirror-symmetric grid lines, so that symmetry can be detected exactly.
 */
import type { DirectionLines, SolverDomain } from './domain';
import { baseLines, type GradingRule, uniqueSorted } from './grid-lines';

/** Fine cell size as a share of the smallest feature gap (common practice, no source; tuned in the self-convergence test). */
const CORNER_SHARE = 1 / 3;
/** Bounds on the fine cell size, as shares of the section size. */
const FINEST_SHARE = 1 / 300;
const COARSEST_FINE_SHARE = 1 / 20;
/** Largest cell inside the features, as a share of the section size. */
const FEATURE_SHARE = 1 / 12;
/** Ratio of neighbouring cell sizes. */
const GROWTH = 1.5;

export interface BaseGrid {
  xs: number[];
  ys: number[];
}

/** The base grid covering the whole domain. */
export function baseGrid(domain: SolverDomain): BaseGrid {
  const { box, feature, size, tolerance } = domain;
  const fine = Math.min(COARSEST_FINE_SHARE * size, Math.max(FINEST_SHARE * size, CORNER_SHARE * smallestGap(domain)));
  const rule = (start: number, end: number): GradingRule => ({ fine, coarse: FEATURE_SHARE * size, growth: GROWTH, featureStart: start, featureEnd: end });
  const ys = baseLines(box.bottom, box.top, [...domain.y.aligned, ...domain.y.refine], domain.y.refine, rule(feature.bottom, feature.top), tolerance);
  return { xs: symmetricLines(domain, rule(feature.left, feature.right)), ys };
}

/** x lines: built on the right half and mirrored when the required lines allow it, so mirror images match to the last bit. */
function symmetricLines(domain: SolverDomain, rule: GradingRule): number[] {
  const { box, axis, tolerance } = domain;
  const required = [...domain.x.aligned, ...domain.x.refine];
  if (!isMirrorSymmetric(required, axis, tolerance) || !isMirrorSymmetric(domain.x.refine, axis, tolerance)) {
    return baseLines(box.left, box.right, required, domain.x.refine, rule, tolerance);
  }
  const right = baseLines(axis, box.right, required, domain.x.refine, rule, tolerance);
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
      [...lines.refine, ...lines.aligned].filter((value) => value >= start - tolerance && value <= end + tolerance),
      tolerance,
    );
    let smallest = Infinity;
    for (let i = 1; i < inside.length; i++) smallest = Math.min(smallest, inside[i]! - inside[i - 1]!);
    return smallest;
  };
  return Math.min(gap(domain.x, feature.left, feature.right), gap(domain.y, feature.bottom, feature.top), domain.size);
}
