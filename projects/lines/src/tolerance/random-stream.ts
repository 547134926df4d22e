/**
 * A small deterministic pseudo-random stream, so tolerance runs repeat exactly
 * for the same `randomState` (tests and screens stay stable).
 */

/**
 * Uniform numbers in [0, 1) from a 32-bit state.
 * Method: Mulberry32 (T. Ettinger, 2017, public-domain 32-bit generator; period 2³²).
 * Valid:  statistical quality ample for Monte Carlo tolerance spreads; not for cryptography.
 */
export function uniformStream(randomState: number): () => number {
  let state = randomState >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    return ((z ^ (z >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Standard normal numbers from a uniform stream.
 * Method: Box–Muller transform (G. E. P. Box, M. E. Muller, Ann. Math. Stat. 29, 1958, pp. 610–611).
 */
export function normalStream(uniform: () => number): () => number {
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const value = spare;
      spare = undefined;
      return value;
    }
    const radius = Math.sqrt(-2 * Math.log(1 - uniform()));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
}
