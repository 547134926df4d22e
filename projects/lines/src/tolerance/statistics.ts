/**
 * Summary statistics of a sample, with a histogram for the tolerance chart.
 */

export interface Histogram {
  /** Bin edges, one more than counts. */
  edges: number[];
  counts: number[];
}

export interface SampleStatistics {
  mean: number;
  /** Sample standard deviation (n − 1). */
  std: number;
  min: number;
  max: number;
  histogram: Histogram;
}

/**
 * Mean, sample standard deviation, extremes and an equal-width histogram of values[0…count).
 * Method: Welford's one-pass mean and variance (B. P. Welford, Technometrics 4, 1962, pp. 419–420).
 */
export function sampleStatistics(values: Float64Array, count: number, bins: number): SampleStatistics {
  let mean = 0;
  let squares = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let index = 0; index < count; index++) {
    const value = values[index];
    const delta = value - mean;
    mean += delta / (index + 1);
    squares += delta * (value - mean);
    if (value < min) min = value;
    if (value > max) max = value;
  }
  const width = (max - min) / bins || 1;
  const counts = new Array<number>(bins).fill(0);
  for (let index = 0; index < count; index++) {
    counts[Math.min(bins - 1, Math.floor((values[index] - min) / width))]++;
  }
  const edges = Array.from({ length: bins + 1 }, (_, index) => min + index * width);
  return { mean, std: count > 1 ? Math.sqrt(squares / (count - 1)) : 0, min, max, histogram: { edges, counts } };
}
