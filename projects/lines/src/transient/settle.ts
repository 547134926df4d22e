/**
 * When a waveform settles, and when it crosses a threshold: from samples by
 * linear interpolation, or from an exact evaluator by bisection.
 */

/** Bisection rounds: 2⁻⁶⁰ of the bracket is below double precision of any time here. */
const BISECTION_ROUNDS = 60;

/**
 * Time after which |v − final| ≤ tolerance for the rest of the samples:
 * 0 when no sample is outside the band, Infinity when the last one is. The
 * crossing between the last outside sample and the next is interpolated
 * linearly, or found by bisection on `exact` when given.
 */
export function settleTimeOfSamples(
  time: number[],
  values: number[],
  final: number,
  tolerance: number,
  exact?: (t: number) => number,
): number {
  const isOutside = (v: number) => Math.abs(v - final) > tolerance;
  let last = values.length - 1;
  while (last >= 0 && !isOutside(values[last])) last--;
  if (last < 0) return 0;
  if (last === values.length - 1) return Infinity;
  const lo = time[last];
  const hi = time[last + 1];
  if (exact) return bisect((t) => isOutside(exact(t)), lo, hi);
  const a = values[last];
  const b = values[last + 1];
  const edge = a > final ? final + tolerance : final - tolerance;
  return lo + ((hi - lo) * (a - edge)) / (a - b);
}

/** Last t in [lo, hi] with isOutside(t) true, given isOutside(lo) and !isOutside(hi). */
function bisect(isOutside: (t: number) => boolean, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let round = 0; round < BISECTION_ROUNDS && b - a > 0; round++) {
    const mid = (a + b) / 2;
    if (mid === a || mid === b) break;
    if (isOutside(mid)) a = mid;
    else b = mid;
  }
  return b;
}

/**
 * Exact settling time of a sum of edges (the lattice): scans back from
 * `endTime` (after which the waveform is known to stay in band) in steps of
 * `step` until a point outside the band, then bisects. `startTime` bounds the
 * scan; reaching it without leaving the band means settled from 0.
 */
export function settleTimeOfFunction(
  value: (t: number) => number,
  final: number,
  tolerance: number,
  startTime: number,
  endTime: number,
  step: number,
): number {
  const isOutside = (t: number) => Math.abs(value(t) - final) > tolerance;
  for (let t = endTime; t >= startTime; t -= step) {
    if (isOutside(t)) return bisect(isOutside, t, Math.min(t + step, endTime));
  }
  return 0;
}

/** Whether and when a waveform passes a threshold. */
export interface ThresholdCrossing {
  /** 'rising' when the waveform ends above the threshold, else 'falling'. */
  direction: 'rising' | 'falling';
  /** First time it reaches the threshold in that direction [s]; null if never. */
  firstCrossing: number | null;
  /** Time after which it stays past the threshold to the end of the samples [s]; null if it ends short of it. */
  staysPastFrom: number | null;
}

/**
 * Method: scan of the samples with linear interpolation between the two
 *   samples around each crossing.
 * Valid:  accurate to the sample spacing's share of the edge; `direction`
 *   defaults to the side where the waveform ends.
 */
export function thresholdCrossingOfSamples(
  time: number[],
  values: number[],
  threshold: number,
  direction?: 'rising' | 'falling',
): ThresholdCrossing {
  const last = values[values.length - 1];
  const dir = direction ?? (last >= threshold ? 'rising' : 'falling');
  const isPast = (v: number) => (dir === 'rising' ? v >= threshold : v <= threshold);
  const at = (i: number) => {
    // Interpolated time where the segment (i − 1, i) reaches the threshold.
    if (i === 0) return time[0];
    const a = values[i - 1];
    const b = values[i];
    return time[i - 1] + ((time[i] - time[i - 1]) * (threshold - a)) / (b - a);
  };
  let first: number | null = null;
  for (let i = 0; i < values.length && first === null; i++) if (isPast(values[i])) first = at(i);
  let staysPastFrom: number | null = null;
  if (isPast(last)) {
    let i = values.length - 1;
    while (i > 0 && isPast(values[i - 1])) i--;
    staysPastFrom = at(i);
  }
  return { direction: dir, firstCrossing: first, staysPastFrom };
}
