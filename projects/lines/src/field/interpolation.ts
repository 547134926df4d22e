/**
 * Bilinear interpolation between rectilinear grids: warm starts from a coarser
 * grid, and the sampled potential map for the screen's picture.
 */

/**
 * For each target coordinate, the index of the source cell containing it and
 * the fraction across that cell. Both coordinate lists are ascending; targets
 * outside the source range are clamped to its ends.
 */
export function cellLocations(source: ArrayLike<number>, targets: ArrayLike<number>): { index: Int32Array; fraction: Float64Array } {
  const index = new Int32Array(targets.length);
  const fraction = new Float64Array(targets.length);
  let cell = 0;
  const last = source.length - 2;
  for (let t = 0; t < targets.length; t++) {
    const value = targets[t]!;
    while (cell > 0 && value < source[cell]!) cell--;
    while (cell < last && value > source[cell + 1]!) cell++;
    const width = source[cell + 1]! - source[cell]!;
    index[t] = cell;
    fraction[t] = Math.min(1, Math.max(0, (value - source[cell]!) / width));
  }
  return { index, fraction };
}

/** Values of `field` (on sourceX × sourceY, row-major) at every node of targetX × targetY. */
export function interpolateGrid(
  field: Float64Array,
  sourceX: ArrayLike<number>,
  sourceY: ArrayLike<number>,
  targetX: ArrayLike<number>,
  targetY: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  const columns = cellLocations(sourceX, targetX);
  const rows = cellLocations(sourceY, targetY);
  const nx = sourceX.length;
  for (let j = 0; j < targetY.length; j++) {
    const row = rows.index[j]! * nx;
    const fy = rows.fraction[j]!;
    for (let i = 0; i < targetX.length; i++) {
      const k = row + columns.index[i]!;
      const fx = columns.fraction[i]!;
      const lower = field[k]! + fx * (field[k + 1]! - field[k]!);
      const upper = field[k + nx]! + fx * (field[k + nx + 1]! - field[k + nx]!);
      out[j * targetX.length + i] = lower + fy * (upper - lower);
    }
  }
  return out;
}
