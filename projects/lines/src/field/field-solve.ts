/**
 * The quasi-static 2D field solver: Laplace's equation on the cross-section by
 * finite differences on a graded rectilinear grid, solved by MIC(0)-
 * preconditioned conjugate gradients, refined until Z0 stops changing.
 *
 * Method: finite differences were chosen over a boundary-element method because
 * they take any mix of stacked, boxed and coated dielectrics with no extra
 * Green's functions, give sparse symmetric systems that CG solves in typed
 * arrays, and make symmetry planes and shields simple boundary conditions.
 * Refinement cuts every base cell into n parts (n = 1, 2, 3, 4, 6, 8, …);
 * Richardson extrapolation of the capacitances over the last three grids gives
 * the result and its estimated error.
 * Valid: TEM (quasi-static) lines uniform along their length; perfect
 * conductors; isotropic lossless dielectrics.
 */
import { LineInputError } from '../errors';
import type { CrossSection } from './cross-section';
import { baseGrid } from './base-grid';
import { solverDomain } from './domain';
import { subdivide } from './grid-lines';
import { type GridSolution, solveGrid } from './grid-solution';
import { type LineParameters, lineParameters } from './line-parameters';
import { potentialMap, type PotentialMap } from './potential-map';
import { extrapolate } from './richardson';
import { fullDomainPlan, planSolves, type SolvePlan } from './symmetry';
import { validateCrossSection } from './validate-section';

/** Default relative change of Z0 accepted as converged (0.5 %). */
export const FIELD_DEFAULT_TOLERANCE = 0.005;
/** Default time cap [ms]. */
export const FIELD_DEFAULT_MAX_MILLIS = 10_000;
/** Default memory cap in grid cells: about 150 (single line) to 300 (pair, mixed dielectric) bytes per cell while solving, so ≤ 150 MB. */
export const FIELD_DEFAULT_MAX_CELLS = 500_000;
/** Base cells are cut into this many parts per side on successive grids (ratio ≈ 1.4, so a cap wastes little). */
const REFINEMENTS = [1, 2, 3, 4, 6, 8, 11, 16, 22, 32, 45, 64];
/** Grids always solved, whatever the caps, so that every result has a finite error estimate (the first two are tiny). */
const MIN_LEVELS = 2;
/** Relative difference of the two self-capacitances above which a pair counts as unequal. */
const ASYMMETRY_NOTICE = 1e-3;
/** Solve time grows about as cells^1.25 with MIC(0)-CG (common practice, no source; measured in bench/field.bench.ts). */
const TIME_GROWTH = 1.25;

export interface FieldSolveProgress {
  /** Refinement level just finished (0 = base grid). */
  level: number;
  cells: number;
  z0: number;
  estimatedError: number;
  elapsedMillis: number;
}

export interface FieldSolveOptions {
  /** Stop when the estimated relative error of Z0 is below this; default 0.005. */
  tolerance?: number;
  /** Time cap [ms]; when reached the best result so far is returned with a warning. */
  maxMillis?: number;
  /** Memory cap in grid cells; likewise. */
  maxCells?: number;
  /** Called after every grid with the fraction done (0…1). */
  onProgress?: (fraction: number, info: FieldSolveProgress) => void;
  /**
   * Polled during the iterations; true stops the solve with FieldSolveCancelledError.
   * The solve runs synchronously, so inside a Web Worker or worker_thread a
   * cancel message cannot arrive mid-solve: back this by a SharedArrayBuffer
   * flag (`() => Atomics.load(flag, 0) === 1`) or terminate the worker.
   */
  isCancelled?: () => boolean;
  /** An AbortSignal or anything with `aborted`, polled like isCancelled. */
  signal?: { readonly aborted: boolean };
  /** Use an exact mirror symmetry when the section has one (default true); false solves the whole domain. */
  useSymmetry?: boolean;
}

/** One grid of the refinement sequence, for reports. */
export interface FieldSolveLevel {
  parts: number;
  cells: number;
  iterations: number;
  z0: number;
  millis: number;
}

export interface FieldSolveResult extends LineParameters {
  /**
   * Estimated relative error of the impedances (largest over z0, or zOdd and zEven for a pair):
   * the size of the Richardson correction on the finest grid. The values returned are the
   * extrapolated ones, whose actual error against exact results was 5–50× smaller in the tests;
   * the open-boundary truncation (≈ 0.01 %, see domain.ts) is not included.
   */
  estimatedError: number;
  /** Cells of the finest grid solved (half the section when symmetry was used). */
  cells: number;
  symmetry: SolvePlan['symmetry'];
  levels: FieldSolveLevel[];
  warnings: string[];
  /** Sampled potential of the first signal conductor's (for a pair: the odd mode's) solution. */
  potential: PotentialMap;
}

/** Thrown when isCancelled or the signal stops a solve. */
export class FieldSolveCancelledError extends Error {
  override readonly name = 'FieldSolveCancelledError';
  constructor() {
    super('field solve cancelled');
  }
}

/** Solves a cross-section; see the file header for the method. */
export async function fieldSolve(section: CrossSection, options: FieldSolveOptions = {}): Promise<FieldSolveResult> {
  validateCrossSection(section);
  const tolerance = options.tolerance ?? FIELD_DEFAULT_TOLERANCE;
  const maxMillis = options.maxMillis ?? FIELD_DEFAULT_MAX_MILLIS;
  const maxCells = options.maxCells ?? FIELD_DEFAULT_MAX_CELLS;
  const isCancelled = (): boolean => options.signal?.aborted === true || options.isCancelled?.() === true;
  const started = Date.now();

  const domain = solverDomain(section);
  const base = baseGrid(domain);
  const plan = options.useSymmetry === false ? fullDomainPlan(domain.bodyCount - 1) : planSolves(section, domain, base.xs, base.ys);
  const baseXs = plan.isHalf ? base.xs.filter((x) => x >= domain.axis - domain.tolerance) : base.xs;
  const baseCells = (baseXs.length - 1) * (base.ys.length - 1);
  const history: { parts: number; solution: GridSolution; millis: number }[] = [];
  const warnings: string[] = [];
  let estimate: Estimate | undefined;

  for (const parts of REFINEMENTS) {
    const cells = baseCells * parts * parts;
    const last = history.length >= MIN_LEVELS ? history[history.length - 1] : undefined;
    const elapsed = Date.now() - started;
    if (last && cells > maxCells) {
      warnings.push(`stopped at ${last.solution.cells} cells (cap ${maxCells}) before reaching the ${percent(tolerance)} tolerance`);
      break;
    }
    if (last && elapsed + last.millis * (cells / last.solution.cells) ** TIME_GROWTH > maxMillis) {
      warnings.push(`stopped after ${elapsed} ms (cap ${maxMillis} ms) before reaching the ${percent(tolerance)} tolerance`);
      break;
    }
    const levelStart = Date.now();
    const solution = solveGrid(section, domain, plan, subdivide(baseXs, parts), subdivide(base.ys, parts), history[history.length - 1]?.solution, isCancelled);
    if (!solution) throw new FieldSolveCancelledError();
    if (history.length === 0) requireSeparateConductors(section, solution);
    // Only the newest potentials are needed (warm start, picture); older grids keep their matrices for Richardson.
    const previous = history[history.length - 1];
    if (previous) previous.solution.potentials = { dielectric: [], vacuum: [] };
    history.push({ parts, solution, millis: Date.now() - levelStart });
    estimate = estimateLimit(history);
    const info = { level: history.length - 1, cells: solution.cells, z0: estimate.parameters.z0, estimatedError: estimate.error, elapsedMillis: Date.now() - started };
    options.onProgress?.(Math.min(1, Math.max(info.elapsedMillis / maxMillis, history.length >= 3 ? tolerance / estimate.error : 0)), info);
    if (history.length >= 3 && estimate.error <= tolerance) break;
  }
  if (warnings.length === 0 && estimate!.error > tolerance) {
    warnings.push(`the finest grid (${history[history.length - 1]!.solution.cells} cells) did not reach the ${percent(tolerance)} tolerance`);
  }
  const [c11, c22] = [estimate!.parameters.capacitance[0]![0]!, estimate!.parameters.capacitance[1]?.[1]];
  if (c22 !== undefined && estimate!.parameters.capacitance.length === 2 && Math.abs(c11 - c22) > ASYMMETRY_NOTICE * c11) {
    warnings.push('the two conductors are not alike: zOdd and zEven use their mean self-capacitance, an approximation for unequal lines');
  }
  const finest = history[history.length - 1]!;
  const picked = plan.symmetry === 'pair' ? 1 : 0;
  const mirror = plan.symmetry === 'none' ? 0 : plan.symmetry === 'pair' ? -1 : 1;
  const excitation = plan.symmetry === 'pair' ? 'odd mode: one conductor at +1 V, the other at −1 V' : 'first signal conductor at 1 V, all others at 0 V';
  return {
    ...estimate!.parameters,
    estimatedError: estimate!.error,
    cells: finest.solution.cells,
    symmetry: plan.symmetry,
    levels: history.map(({ parts, solution, millis }) => ({
      parts,
      cells: solution.cells,
      iterations: solution.iterations,
      z0: lineParameters(solution.capacitance, solution.vacuumCapacitance).z0,
      millis,
    })),
    warnings,
    potential: potentialMap(finest.solution.potentials.dielectric[picked]!, domain.feature, domain.box, domain.axis, mirror, excitation),
  };
}

/** A signal conductor buried in another one holds no charge; say which instead of returning an infinite Z0. */
function requireSeparateConductors(section: CrossSection, solution: GridSolution): void {
  const signals = section.conductors.map((conductor, index) => ({ conductor, index })).filter(({ conductor }) => conductor.role === 'signal');
  solution.capacitance.forEach((row, i) => {
    if (!(row[i]! > 0 && Number.isFinite(row[i]!))) throw new LineInputError(`conductors[${signals[i]!.index}]`, 'lies inside another conductor');
  });
}

interface Estimate {
  parameters: LineParameters;
  error: number;
}

/**
 * The extrapolated parameters and their estimated error: the Richardson
 * correction of the impedances, or their last change where the capacitances
 * are not yet converging regularly (or fewer than three grids exist).
 */
function estimateLimit(history: { parts: number; solution: GridSolution }[]): Estimate {
  const finest = history[history.length - 1]!.solution;
  const finestParameters = lineParameters(finest.capacitance, finest.vacuumCapacitance);
  if (history.length < 2) return { parameters: finestParameters, error: Infinity };
  const previous = history[history.length - 2]!.solution;
  const change = impedanceDifference(finestParameters, lineParameters(previous.capacitance, previous.vacuumCapacitance));
  if (history.length < 3) return { parameters: finestParameters, error: change };
  const last3 = history.slice(-3);
  const sizes = last3.map(({ parts }) => 1 / parts) as [number, number, number];
  let isRegular = true;
  const limit = (pick: (solution: GridSolution) => number[][]): number[][] =>
    pick(finest).map((row, i) =>
      row.map((_, j) => {
        const values = last3.map(({ solution }) => pick(solution)[i]![j]!) as [number, number, number];
        const result = extrapolate(values, sizes);
        if (result.order === undefined) isRegular = false;
        return result.value;
      }),
    );
  const parameters = lineParameters(
    limit((solution) => solution.capacitance),
    limit((solution) => solution.vacuumCapacitance),
  );
  const correction = impedanceDifference(parameters, finestParameters);
  return isRegular ? { parameters, error: correction } : { parameters: finestParameters, error: change };
}

/** Largest relative difference of the impedances that matter (z0; zOdd and zEven for a pair). */
function impedanceDifference(a: LineParameters, b: LineParameters): number {
  const pairs: [number | undefined, number | undefined][] = [
    [a.z0, b.z0],
    [a.zOdd, b.zOdd],
    [a.zEven, b.zEven],
  ];
  let largest = 0;
  for (const [x, y] of pairs) if (x !== undefined && y !== undefined) largest = Math.max(largest, Math.abs(x - y) / Math.abs(x));
  return largest;
}

function percent(value: number): string {
  return `${Number((value * 100).toPrecision(3))} %`;
}
