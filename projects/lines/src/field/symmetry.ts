/**
 * Mirror symmetry about the domain's vertical axis, used where it is exact: a
 * section whose signal conductors are each symmetric is solved on the right
 * half with a mirror (∂φ/∂n = 0) axis; a mirrored pair of signal conductors is
 * solved twice on the right half, even mode (mirror axis) and odd mode (axis at
 * 0 V), which are the pair's two TEM modes by symmetry. Either way the grid is
 * half as large for the same accuracy.
 */
import type { CrossSection } from './cross-section';
import type { SolverDomain } from './domain';
import { permittivityAt } from './shapes';
import type { AxisCondition } from './stencil';

export interface PlannedSolve {
  axis: AxisCondition;
  /** The body held at 1 V (all others at 0 V). */
  body: number;
}

export interface SolvePlan {
  symmetry: 'none' | 'mirror' | 'pair';
  /** Whether the grid covers only the right half (x ≥ axis). */
  isHalf: boolean;
  solves: PlannedSolve[];
  /** The Maxwell matrix over the signal conductors from the energy forms E[i][j] of the solves. */
  capacitanceMatrix(energies: number[][]): number[][];
}

/** Relative tolerance when comparing mirrored coordinates. */
const MIRROR_TOLERANCE = 1e-9;

/**
 * Chooses the plan: checks that the grid lines and, on the given full base
 * grid, every node's body and every cell's permittivity are mirror images.
 */
export function planSolves(section: CrossSection, domain: SolverDomain, xs: ArrayLike<number>, ys: ArrayLike<number>): SolvePlan {
  const signals = domain.bodyCount - 1;
  const mirrorOf = mirroredBodies(section, domain, xs, ys);
  if (mirrorOf && mirrorOf.every((image, body) => image === body)) {
    return {
      symmetry: 'mirror',
      isHalf: true,
      solves: range(signals).map((i) => ({ axis: 'even', body: i + 1 })),
      capacitanceMatrix: (energies) => energies.map((row) => row.map((value) => 2 * value)),
    };
  }
  if (mirrorOf && signals === 2 && mirrorOf[1] === 2) {
    const right = rightmostSignal(section);
    return {
      symmetry: 'pair',
      isHalf: true,
      solves: [
        { axis: 'even', body: right },
        { axis: 'odd', body: right },
      ],
      capacitanceMatrix: (energies) => {
        const even = energies[0]![0]!;
        const odd = energies[1]![1]!;
        const self = (even + odd) / 2;
        const mutual = (even - odd) / 2;
        return [
          [self, mutual],
          [mutual, self],
        ];
      },
    };
  }
  return fullDomainPlan(signals);
}

/** The plan without symmetry: one solve per signal conductor on the whole domain. */
export function fullDomainPlan(signals: number): SolvePlan {
  return {
    symmetry: 'none',
    isHalf: false,
    solves: range(signals).map((i) => ({ axis: 'wall', body: i + 1 })),
    capacitanceMatrix: (energies) => energies,
  };
}

/** For each body, the body its mirror image belongs to; undefined when the section is not mirror-symmetric. */
function mirroredBodies(section: CrossSection, domain: SolverDomain, xs: ArrayLike<number>, ys: ArrayLike<number>): number[] | undefined {
  const axis = domain.axis;
  const tolerance = MIRROR_TOLERANCE * domain.size;
  const nx = xs.length;
  for (let i = 0; i < nx; i++) if (Math.abs(axis - xs[i]! - (xs[nx - 1 - i]! - axis)) > tolerance) return undefined;
  const image = new Array<number>(domain.bodyCount).fill(-1);
  image[0] = 0;
  for (let j = 0; j < ys.length; j++) {
    for (let i = 0; i < nx; i++) {
      const body = domain.bodyAt(xs[i]!, ys[j]!);
      const mirrored = domain.bodyAt(2 * axis - xs[i]!, ys[j]!);
      if ((body < 0) !== (mirrored < 0)) return undefined;
      if (body < 0) continue;
      if (image[body] === -1) image[body] = mirrored;
      else if (image[body] !== mirrored) return undefined;
    }
  }
  for (let j = 0; j < ys.length - 1; j++) {
    for (let i = 0; i < nx - 1; i++) {
      if (!isMirroredCell(section, axis, (xs[i]! + xs[i + 1]!) / 2, (ys[j]! + ys[j + 1]!) / 2)) return undefined;
    }
  }
  return image.every((body) => body >= 0) ? image : undefined;
}

function isMirroredCell(section: CrossSection, axis: number, x: number, y: number): boolean {
  return permittivityAt(section, x, y) === permittivityAt(section, 2 * axis - x, y);
}

/** The 1-based body index of the signal conductor whose centre lies furthest right. */
function rightmostSignal(section: CrossSection): number {
  const signals = section.conductors.filter((conductor) => conductor.role === 'signal');
  let best = 0;
  signals.forEach((conductor, index) => {
    if (centreX(conductor.shape) > centreX(signals[best]!.shape)) best = index;
  });
  return best + 1;
}

function centreX(shape: CrossSection['conductors'][number]['shape']): number {
  return shape.shape === 'rectangle' ? (shape.left + shape.right) / 2 : shape.centerX;
}

function range(count: number): number[] {
  return Array.from({ length: count }, (_, i) => i);
}
