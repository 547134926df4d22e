/**
 * Grid lines in one direction: every required line present, cells graded
 * geometrically away from conductor corners (where the field is singular) and
 * growing again outside the features towards the far walls.
 *
 * The base grid is refined by cutting every base cell into n equal parts, so
 * the grids of a refinement sequence are geometrically similar (h ∝ 1/n), which
 * is what Richardson extrapolation assumes.
 */

/** A range (a single point when start = end) in which cells are at most `size`; away from it the allowed size grows with the distance. */
export interface GradingZone {
  start: number;
  end: number;
  size: number;
}

/** How a direction's lines are spaced: the cell size at x is min over zones of size + (growth − 1)·distance(x, zone). */
export interface GradingRule {
  zones: GradingZone[];
  /** Ratio between neighbouring cell sizes, > 1. */
  growth: number;
}

/** Integration sub-steps per cell when spreading the cell density over an interval. */
const SUBSTEPS_PER_CELL = 8;

/**
 * Base lines between `start` and `end` (both included): every line of `required`
 * in the range, with cells whose size follows `rule` in between.
 */
export function baseLines(start: number, end: number, required: number[], rule: GradingRule, tolerance: number): number[] {
  const inside = required.filter((value) => value > start + tolerance && value < end - tolerance);
  const keys = uniqueSorted([start, end, ...inside], tolerance);
  const cellSize = (position: number): number => {
    let size = Infinity;
    for (const zone of rule.zones) {
      const distance = Math.max(0, zone.start - position, position - zone.end);
      size = Math.min(size, zone.size + (rule.growth - 1) * distance);
    }
    return size;
  };
  const lines = [keys[0]!];
  for (let index = 1; index < keys.length; index++) lines.push(...intervalLines(keys[index - 1]!, keys[index]!, cellSize));
  return lines;
}

/** Cuts every cell of `base` into `parts` equal cells. */
export function subdivide(base: readonly number[], parts: number): Float64Array {
  const lines = new Float64Array((base.length - 1) * parts + 1);
  for (let cell = 0; cell < base.length - 1; cell++) {
    const from = base[cell]!;
    const step = (base[cell + 1]! - from) / parts;
    for (let part = 0; part < parts; part++) lines[cell * parts + part] = from + part * step;
  }
  lines[lines.length - 1] = base[base.length - 1]!;
  return lines;
}

/** Lines after `from` up to and including `to`, equidistributing the cell density 1/size. */
function intervalLines(from: number, to: number, cellSize: (position: number) => number): number[] {
  const positions = [from];
  const counts = [0];
  let position = from;
  let count = 0;
  while (position < to) {
    const step = Math.min(cellSize(position) / SUBSTEPS_PER_CELL, to - position);
    count += step / cellSize(position + step / 2);
    position += step;
    positions.push(position);
    counts.push(count);
  }
  const cells = Math.max(1, Math.round(count));
  const lines: number[] = [];
  let sample = 1;
  for (let line = 1; line < cells; line++) {
    const target = (line * count) / cells;
    while (counts[sample]! < target) sample++;
    const fraction = (target - counts[sample - 1]!) / (counts[sample]! - counts[sample - 1]!);
    lines.push(positions[sample - 1]! + fraction * (positions[sample]! - positions[sample - 1]!));
  }
  lines.push(to);
  return lines;
}

/** Sorted values with near-duplicates (closer than `tolerance`) merged. */
export function uniqueSorted(values: number[], tolerance: number): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  const result: number[] = [];
  for (const value of sorted) if (result.length === 0 || value - result[result.length - 1]! > tolerance) result.push(value);
  return result;
}
