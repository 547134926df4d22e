/**
 * One grid of the refinement sequence: the stencil, a Laplace solve per
 * excitation and medium (warm-started from the previous grid), and the
 * capacitance matrices from the field energy. The energy form is stationary at
 * the exact discrete solution, so an iteration error ε in the potential costs
 * only O(ε²) in C — which is why the iterations can stop early.
 */
import { type LaplaceSystem, laplaceSystem, solveConjugateGradient } from './conjugate-gradient';
import type { CrossSection } from './cross-section';
import type { SolverDomain } from './domain';
import { interpolateGrid } from './interpolation';
import { type AxisCondition, buildStencil, type Stencil } from './stencil';
import type { SolvePlan } from './symmetry';

/** CG stops at this relative residual; the energy then carries an error of its square (see above). */
const RELATIVE_RESIDUAL = 1e-5;
/** Hard iteration limit per solve, far above what MIC(0)-CG needs on these grids. */
const MAX_ITERATIONS = 5000;

export type Medium = 'dielectric' | 'vacuum';

/** The potential of one solve on one grid, kept for the next grid's warm start and for the picture. */
export interface GridPotential {
  xs: Float64Array;
  ys: Float64Array;
  /** Node potentials, row-major, fixed nodes included [V]. */
  values: Float64Array;
}

export interface GridSolution {
  cells: number;
  iterations: number;
  /** Maxwell capacitance matrices over the signal conductors [F/m]. */
  capacitance: number[][];
  vacuumCapacitance: number[][];
  /** potentials[medium][solve] */
  potentials: Record<Medium, GridPotential[]>;
}

/** Solves every excitation of `plan` on the grid xs × ys. Returns undefined when cancelled. */
export function solveGrid(
  section: CrossSection,
  domain: SolverDomain,
  plan: SolvePlan,
  xs: Float64Array,
  ys: Float64Array,
  previous: GridSolution | undefined,
  isCancelled: () => boolean,
): GridSolution | undefined {
  const stencils = new Map<AxisCondition, Stencil>();
  const stencilFor = (axis: AxisCondition): Stencil => {
    let stencil = stencils.get(axis);
    if (!stencil) stencils.set(axis, (stencil = buildStencil(section, domain, xs, ys, axis)));
    return stencil;
  };
  const first = stencilFor(plan.solves[0]!.axis);
  const isHomogeneous = first.vacuumEast === undefined;
  const media: Medium[] = isHomogeneous ? ['dielectric'] : ['dielectric', 'vacuum'];
  const potentials: Record<Medium, GridPotential[]> = { dielectric: [], vacuum: [] };
  const energies: Record<Medium, number[][]> = { dielectric: [], vacuum: [] };
  let iterations = 0;

  for (const medium of media) {
    const systems = new Map<AxisCondition, LaplaceSystem>();
    for (const [index, solve] of plan.solves.entries()) {
      const stencil = stencilFor(solve.axis);
      const east = medium === 'vacuum' ? stencil.vacuumEast! : stencil.east;
      const north = medium === 'vacuum' ? stencil.vacuumNorth! : stencil.north;
      let system = systems.get(solve.axis);
      if (!system) systems.set(solve.axis, (system = laplaceSystem(stencil.nx, stencil.owner, east, north)));
      const voltages = new Float64Array(domain.bodyCount);
      voltages[solve.body] = 1;
      const { b, x } = boundaryValues(stencil, east, north, voltages);
      const start = previous?.potentials[medium][index];
      if (start) warmStart(stencil, start, x);
      const used = solveConjugateGradient(system, b, x, { relativeResidual: RELATIVE_RESIDUAL, maxIterations: MAX_ITERATIONS, isCancelled });
      if (used < 0) return undefined;
      iterations += used;
      for (let k = 0; k < x.length; k++) if (stencil.owner[k]! >= 0) x[k] = voltages[stencil.owner[k]!]!;
      potentials[medium].push({ xs, ys, values: x });
    }
    energies[medium] = plan.solves.map((solve, i) =>
      plan.solves.map((other, j) => {
        const stencil = stencilFor(solve.axis);
        const east = medium === 'vacuum' ? stencil.vacuumEast! : stencil.east;
        const north = medium === 'vacuum' ? stencil.vacuumNorth! : stencil.north;
        return solve.axis === other.axis ? energyForm(stencil.nx, east, north, potentials[medium][i]!.values, potentials[medium][j]!.values) : 0;
      }),
    );
  }
  const capacitance = plan.capacitanceMatrix(energies.dielectric);
  const vacuumCapacitance = isHomogeneous
    ? capacitance.map((row) => row.map((value) => value / first.uniformPermittivity))
    : plan.capacitanceMatrix(energies.vacuum);
  return { cells: (xs.length - 1) * (ys.length - 1), iterations, capacitance, vacuumCapacitance, potentials };
}

/** Right-hand side b (fixed neighbours' contributions) and a zero start vector for the unknowns. */
function boundaryValues(stencil: Stencil, east: Float64Array, north: Float64Array, voltages: Float64Array): { b: Float64Array; x: Float64Array } {
  const { nx, owner } = stencil;
  const size = owner.length;
  const b = new Float64Array(size);
  for (let k = 0; k < size; k++) {
    const e = east[k]!;
    if (e !== 0 && k % nx < nx - 1) couple(owner, voltages, b, k, k + 1, e);
    const n = north[k]!;
    if (n !== 0 && k + nx < size) couple(owner, voltages, b, k, k + nx, n);
  }
  return { b, x: new Float64Array(size) };
}

function couple(owner: Int32Array, voltages: Float64Array, b: Float64Array, a: number, c: number, coupling: number): void {
  const ownerA = owner[a]!;
  const ownerC = owner[c]!;
  if (ownerA < 0 && ownerC >= 0) b[a]! += coupling * voltages[ownerC]!;
  else if (ownerC < 0 && ownerA >= 0) b[c]! += coupling * voltages[ownerA]!;
}

/** Interpolates the previous grid's potential onto the free nodes of this one. */
function warmStart(stencil: Stencil, start: GridPotential, x: Float64Array): void {
  interpolateGrid(start.values, start.xs, start.ys, stencil.xs, stencil.ys, x);
  for (let k = 0; k < x.length; k++) if (stencil.owner[k]! >= 0) x[k] = 0;
}

/** Σ coupling·Δφ·Δψ over every link: the bilinear energy form, = C at 1 V when φ = ψ. */
function energyForm(nx: number, east: Float64Array, north: Float64Array, phi: Float64Array, psi: Float64Array): number {
  let sum = 0;
  const size = phi.length;
  for (let k = 0; k < size; k++) {
    const e = east[k]!;
    if (e !== 0) sum += e * (phi[k]! - phi[k + 1]!) * (psi[k]! - psi[k + 1]!);
    const n = north[k]!;
    if (n !== 0) sum += n * (phi[k]! - phi[k + nx]!) * (psi[k]! - psi[k + nx]!);
  }
  return sum;
}
