/**
 * Richardson extrapolation with the observed order of convergence
 * (L. F. Richardson, "The deferred approach to the limit", Phil. Trans. R. Soc.
 * A 226, 1927, pp. 299–361): three results v1, v2, v3 on grids of size
 * h1 > h2 > h3 fix the order p of the error C·hᵖ from
 * (v1 − v2)/(v2 − v3) = (h1ᵖ − h2ᵖ)/(h2ᵖ − h3ᵖ), and the limit follows.
 */

/** The orders accepted as asymptotic: corner singularities give ≈1–1.4, smooth fields 2 (finite differences). */
const LOWEST_ORDER = 0.5;
const HIGHEST_ORDER = 2;
const BISECTIONS = 60;

export interface Extrapolation {
  /** The extrapolated limit, or v3 when the sequence is not (yet) asymptotic. */
  value: number;
  /** The observed order, when one was found. */
  order?: number;
}

/** Extrapolates three results on grids of sizes h (descending) to h → 0. */
export function extrapolate(values: readonly [number, number, number], sizes: readonly [number, number, number]): Extrapolation {
  const [v1, v2, v3] = values;
  const [h1, h2, h3] = sizes;
  const d12 = v1 - v2;
  const d23 = v2 - v3;
  if (d23 === 0) return { value: v3 };
  const ratio = d12 / d23;
  const model = (p: number): number => (h1 ** p - h2 ** p) / (h2 ** p - h3 ** p);
  // model(p) increases with p; outside the accepted band the results are not asymptotic.
  if (!(ratio >= model(LOWEST_ORDER) && ratio <= model(HIGHEST_ORDER))) return { value: v3 };
  let low = LOWEST_ORDER;
  let high = HIGHEST_ORDER;
  for (let step = 0; step < BISECTIONS; step++) {
    const middle = (low + high) / 2;
    if (model(middle) < ratio) low = middle;
    else high = middle;
  }
  const order = (low + high) / 2;
  return { value: v3 - (d23 * h3 ** order) / (h2 ** order - h3 ** order), order };
}
