/**
 * Finite differences on the rectilinear grid, written as a finite-volume
 * (box-integration) scheme: node potentials, one permittivity per cell, and a
 * coupling per grid link equal to ε·(face width)/(link length), the face being
 * the two half-cells either side of the link. The matrix is symmetric and the
 * field energy per unit length is ½·Σ coupling·(Δφ)², so C = Σ coupling·(Δφ)²
 * at 1 V (Gauss' law and the energy agree for the discrete solution).
 *
 * Curved and slanted conductor boundaries (wires, etched sides) cut grid links:
 * such a link is shortened to the crossing point, θ·h, as in the Shortley–Weller
 * treatment of Dirichlet boundaries (G. H. Shortley and R. Weller, J. Appl.
 * Phys. 9, 1938, pp. 334–348), which keeps the scheme second-order accurate
 * there instead of the first-order staircase.
 */
import { VACUUM_PERMITTIVITY } from '../constants';
import type { CrossSection } from './cross-section';
import type { SolverDomain } from './domain';
import { permittivityAt } from './shapes';

/** What the left column of a half-domain grid is: a plain wall, a mirror (even, ∂φ/∂n = 0) or an antisymmetry plane at 0 V (odd). */
export type AxisCondition = 'wall' | 'even' | 'odd';

/** Cut links shorter than this fraction of their length are kept at it, bounding the matrix's condition number. */
const SHORTEST_CUT = 0.05;
/** Bisection steps locating where a link crosses a conductor boundary (2⁻³⁰ of the link). */
const CUT_BISECTIONS = 30;

export interface Stencil {
  nx: number;
  ny: number;
  xs: Float64Array;
  ys: Float64Array;
  /** Per node: the body (0 ground, i signal) whose potential it has, or −1 for an unknown. */
  owner: Int32Array;
  /** Coupling between node k and k+1 [F/m], per medium. */
  east: Float64Array;
  /** Coupling between node k and k+nx [F/m]. */
  north: Float64Array;
  /** The same couplings with every dielectric replaced by vacuum; undefined when the section is homogeneous. */
  vacuumEast?: Float64Array;
  vacuumNorth?: Float64Array;
  /** The one relative permittivity of a homogeneous section (1 when it is not homogeneous). */
  uniformPermittivity: number;
}

/** Discretises `section` on the grid lines `xs` × `ys`. */
export function buildStencil(section: CrossSection, domain: SolverDomain, xs: Float64Array, ys: Float64Array, axis: AxisCondition): Stencil {
  const nx = xs.length;
  const ny = ys.length;
  const owner = new Int32Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const body = domain.bodyAt(xs[i]!, ys[j]!);
      owner[j * nx + i] = body < 0 && i === 0 && axis === 'odd' ? 0 : body;
    }
  }
  const permittivity = cellPermittivity(section, xs, ys);
  const first = permittivity[0]!;
  const isHomogeneous = permittivity.every((value) => value === first);
  const east = new Float64Array(nx * ny);
  const north = new Float64Array(nx * ny);
  const vacuumEast = isHomogeneous ? undefined : new Float64Array(nx * ny);
  const vacuumNorth = isHomogeneous ? undefined : new Float64Array(nx * ny);
  const cell = (i: number, j: number): number => (i < 0 || j < 0 || i >= nx - 1 || j >= ny - 1 ? 0 : permittivity[j * (nx - 1) + i]!);
  const isInside = (i: number, j: number): number => (i < 0 || j < 0 || i >= nx - 1 || j >= ny - 1 ? 0 : 1);

  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const k = j * nx + i;
      if (i < nx - 1) {
        const length = (xs[i + 1]! - xs[i]!) * cutFraction(domain, owner, xs, ys, k, k + 1, i, j, i + 1, j);
        const below = j > 0 ? (ys[j]! - ys[j - 1]!) / 2 : 0;
        const above = j < ny - 1 ? (ys[j + 1]! - ys[j]!) / 2 : 0;
        east[k] = (VACUUM_PERMITTIVITY * (cell(i, j - 1) * below + cell(i, j) * above)) / length;
        if (vacuumEast) vacuumEast[k] = (VACUUM_PERMITTIVITY * (isInside(i, j - 1) * below + isInside(i, j) * above)) / length;
      }
      if (j < ny - 1) {
        const length = (ys[j + 1]! - ys[j]!) * cutFraction(domain, owner, xs, ys, k, k + nx, i, j, i, j + 1);
        const left = i > 0 ? (xs[i]! - xs[i - 1]!) / 2 : 0;
        const right = i < nx - 1 ? (xs[i + 1]! - xs[i]!) / 2 : 0;
        north[k] = (VACUUM_PERMITTIVITY * (cell(i - 1, j) * left + cell(i, j) * right)) / length;
        if (vacuumNorth) vacuumNorth[k] = (VACUUM_PERMITTIVITY * (isInside(i - 1, j) * left + isInside(i, j) * right)) / length;
      }
    }
  }
  return { nx, ny, xs, ys, owner, east, north, vacuumEast, vacuumNorth, uniformPermittivity: isHomogeneous ? first : 1 };
}

/** Relative permittivity of each cell, sampled at its centre: background first, regions painted in order. */
function cellPermittivity(section: CrossSection, xs: Float64Array, ys: Float64Array): Float64Array {
  const nx = xs.length;
  const ny = ys.length;
  const values = new Float64Array((nx - 1) * (ny - 1));
  for (let j = 0; j < ny - 1; j++) {
    const y = (ys[j]! + ys[j + 1]!) / 2;
    for (let i = 0; i < nx - 1; i++) values[j * (nx - 1) + i] = permittivityAt(section, (xs[i]! + xs[i + 1]!) / 2, y);
  }
  return values;
}

/**
 * Fraction θ of the link from node a to node b that lies outside the conductor
 * when exactly one end is fixed; 1 otherwise.
 */
function cutFraction(
  domain: SolverDomain,
  owner: Int32Array,
  xs: Float64Array,
  ys: Float64Array,
  a: number,
  b: number,
  ia: number,
  ja: number,
  ib: number,
  jb: number,
): number {
  const aFixed = owner[a]! >= 0;
  if (aFixed === owner[b]! >= 0) return 1;
  // March from the free end towards the fixed one.
  const [freeX, freeY, fixedX, fixedY, body] = aFixed
    ? [xs[ib]!, ys[jb]!, xs[ia]!, ys[ja]!, owner[a]!]
    : [xs[ia]!, ys[ja]!, xs[ib]!, ys[jb]!, owner[b]!];
  // The odd-mode axis is ground only on the grid line itself, so its links are never cut.
  if (body === 0 && domain.bodyAt(fixedX, fixedY) !== 0) return 1;
  let outside = 0;
  let inside = 1;
  for (let step = 0; step < CUT_BISECTIONS; step++) {
    const middle = (outside + inside) / 2;
    if (domain.bodyAt(freeX + middle * (fixedX - freeX), freeY + middle * (fixedY - freeY)) === body) inside = middle;
    else outside = middle;
  }
  return Math.max(SHORTEST_CUT, inside);
}
