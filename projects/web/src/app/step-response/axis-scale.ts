/**
 * An SI prefix for a whole axis, so a 5 km cable reads in microseconds and a
 * 5 cm trace in picoseconds: the data are divided by `factor` and the axis
 * says `unit`. engineering-format.ts does the same for single figures.
 */
export interface AxisScale {
  /** SI units per shown unit, e.g. 1e-9 for ns. */
  factor: number;
  /** The shown unit with its prefix, e.g. 'ns'. */
  unit: string;
}

const PREFIXES: readonly [number, string][] = [
  [1e9, 'G'], [1e6, 'M'], [1e3, 'k'], [1, ''], [1e-3, 'm'], [1e-6, 'µ'], [1e-9, 'n'], [1e-12, 'p'], [1e-15, 'f'],
];

/** Prefixes past which an axis keeps the plain unit (gigaseconds and kilovolts are not what anyone means here). */
const LARGEST_PREFIX = { s: 1, V: 1e3, A: 1e3 } as Record<string, number>;

/**
 * The prefix that puts the axis's largest magnitude `span` in [1, 1000).
 * `axisScale(2.5e-8, 's')` → { factor: 1e-9, unit: 'ns' }. A zero or
 * non-finite span keeps the plain unit.
 */
export function axisScale(span: number, unit: string): AxisScale {
  const magnitude = Math.abs(span);
  if (!Number.isFinite(magnitude) || magnitude === 0) return { factor: 1, unit };
  const largest = LARGEST_PREFIX[unit] ?? 1e9;
  const candidates = PREFIXES.filter(([factor]) => factor <= largest);
  // A hair under 1 still counts as 1 so that 999.9… ps does not read as 0.9999 ns.
  const [factor, prefix] = candidates.find(([candidate]) => magnitude >= candidate * 0.9995) ?? candidates[candidates.length - 1];
  return { factor, unit: `${prefix}${unit}` };
}

/** Largest |value| of several arrays, ignoring non-finite entries. */
export function largestMagnitude(...arrays: readonly (readonly number[])[]): number {
  let largest = 0;
  for (const values of arrays) {
    for (const value of values) if (Number.isFinite(value) && Math.abs(value) > largest) largest = Math.abs(value);
  }
  return largest;
}

/** Tick spacings the axis may use: 1, 2 or 5 times a power of ten. */
const NICE_MANTISSAS = [1, 2, 5, 10] as const;
/** Spaces the window is cut into; the chart shows at most eight ticks. */
const WINDOW_SPACES = 7;

/** The smallest 1-2-5 step of at least `raw`. */
export function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const decade = 10 ** Math.floor(Math.log10(raw));
  return NICE_MANTISSAS.find((mantissa) => mantissa * decade >= raw * (1 - 1e-9))! * decade;
}

export interface NiceWindow {
  start: number;
  end: number;
  step: number;
}

/**
 * A plotting window on whole steps that holds [first, last], like an
 * oscilloscope's: it starts a whole step before t = 0 (a pre-trigger view of
 * the edge's start) and ends on the first whole step at or after the data,
 * so the chart's ticks fall on round numbers. `first` ≤ 0 < `last`, in the
 * shown unit.
 */
export function niceWindow(first: number, last: number): NiceWindow {
  const step = niceStep((last - Math.min(first, 0)) / (WINDOW_SPACES - 1));
  // The 1e-9 keeps a value a rounding error past a whole step on that step.
  const start = Math.min(-step, Math.floor(first / step + 1e-9) * step);
  const end = Math.max(Math.ceil(last / step - 1e-9), 1) * step;
  return { start, end, step };
}
