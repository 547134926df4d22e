/**
 * Factors by which conductor surface roughness raises the smooth-conductor
 * loss. Both tend to 1 when the skin depth is large against the roughness.
 */

/** Coefficient 1.4 of the Hammerstad–Bekkadal fit. */
const HAMMERSTAD_BEKKADAL_COEFFICIENT = 1.4;

/**
 * Roughness loss factor K = 1 + (2/π)·atan(1.4·(Δ/δ)²), Δ = RMS roughness.
 * Method: E. O. Hammerstad, F. Bekkadal, Microstrip Handbook, ELAB report, Univ. of Trondheim, 1975.
 * Valid:  1 ≤ K ≤ 2 by construction; known to saturate too early for very rough foils (Δ/δ > ~2).
 */
export function hammerstadBekkadalFactor(rmsRoughness: number, skinDepth: number): number {
  const ratio = rmsRoughness / skinDepth;
  return 1 + (2 / Math.PI) * Math.atan(HAMMERSTAD_BEKKADAL_COEFFICIENT * ratio * ratio);
}

/**
 * Roughness loss factor of the single-size "snowball" model,
 * K = 1 + (3/2)·SR / (1 + δ/a + δ²/(2a²)), SR = N·4πa²/A_flat.
 * Method: P. G. Huray et al., DesignCon 2010 (snowball model, one nodule size;
 *   form recalled from memory, not checked against the text).
 * Valid:  nodules small against the line cross-section; no saturation at high frequency (K → 1 + 1.5·SR).
 */
export function hurayFactor(skinDepth: number, noduleRadius: number, surfaceRatio: number): number {
  const ratio = skinDepth / noduleRadius;
  return 1 + (1.5 * surfaceRatio) / (1 + ratio + (ratio * ratio) / 2);
}
