/**
 * A coarse, uniformly sampled copy of the solved potential, for the screen to
 * draw equipotentials or field lines without the solver's grid. Half-domain
 * solutions are unfolded by their symmetry (odd modes change sign).
 */
import type { Box } from './domain';
import type { GridPotential } from './grid-solution';
import { interpolateGrid } from './interpolation';

/** Samples along the longer side of the picture. */
const MAP_SAMPLES = 96;
/** Margin round the features, as a share of their size. */
const MAP_MARGIN = 0.5;

export interface PotentialMap {
  /** Sample columns [m], ascending. */
  x: number[];
  /** Sample rows [m], ascending. */
  y: number[];
  /** Potential at (x[i], y[j]) is values[j·x.length + i] [V]. */
  values: number[];
  /** What is held at which potential, e.g. 'signal 1 at 1 V, all others at 0 V'. */
  excitation: string;
}

/**
 * Samples `potential` over the features plus a margin, clipped to `domain`.
 * `mirror` is +1 or −1 to unfold a right-half solution about `axis`, 0 for a full one.
 */
export function potentialMap(potential: GridPotential, feature: Box, domain: Box, axis: number, mirror: -1 | 0 | 1, excitation: string): PotentialMap {
  const margin = MAP_MARGIN * Math.max(feature.right - feature.left, feature.top - feature.bottom);
  const left = Math.max(domain.left, feature.left - margin);
  const right = Math.min(domain.right, feature.right + margin);
  const bottom = Math.max(domain.bottom, feature.bottom - margin);
  const top = Math.min(domain.top, feature.top + margin);
  const step = Math.max(right - left, top - bottom) / (MAP_SAMPLES - 1);
  const x = samples(left, right, step);
  const y = samples(bottom, top, step);
  const folded = mirror === 0 ? x : x.map((value) => Math.abs(value - axis) + axis);
  const values = interpolateGrid(potential.values, potential.xs, potential.ys, folded, y, new Float64Array(x.length * y.length));
  if (mirror === -1) {
    for (let j = 0; j < y.length; j++) for (let i = 0; i < x.length; i++) if (x[i]! < axis) values[j * x.length + i]! *= -1;
  }
  return { x, y, values: Array.from(values), excitation };
}

function samples(start: number, end: number, step: number): number[] {
  const count = Math.max(2, Math.round((end - start) / step) + 1);
  return Array.from({ length: count }, (_, i) => start + ((end - start) * i) / (count - 1));
}
