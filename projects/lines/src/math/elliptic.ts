/**
 * Complete elliptic integrals of the first kind, for the conformal-mapping
 * results (Cohn stripline, coupled stripline, coplanar waveguide).
 */

/** AGM iterations stop when the two means agree to this relative difference. */
const AGM_TOLERANCE = 1e-15;

/**
 * Complete elliptic integral of the first kind K(k), modulus k (not parameter m = k²).
 * Method: arithmetic–geometric mean, K(k) = π / (2·AGM(1, √(1−k²)))
 *   (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, eq. 17.6.1).
 * Valid:  0 ≤ k < 1; converges quadratically, full double precision.
 */
export function ellipticK(k: number): number {
  return Math.PI / (2 * arithmeticGeometricMean(1, Math.sqrt((1 - k) * (1 + k))));
}

/**
 * The ratio K(k)/K(k′), k′ = √(1−k²), that every conformal-mapping line result needs.
 * Computed from k and k′ separately so that k close to 0 or 1 keeps its precision
 * (pass `kPrime` when it is known more accurately than √(1−k²)).
 * Method: AGM as in `ellipticK` (A&S 17.6.1).
 * Valid:  0 < k < 1.
 */
export function ellipticRatio(k: number, kPrime = Math.sqrt((1 - k) * (1 + k))): number {
  return arithmeticGeometricMean(1, k) / arithmeticGeometricMean(1, kPrime);
}

/** AGM(a, 0) = 0; otherwise the means converge quadratically, so 64 rounds is a hard stop never reached. */
const AGM_MAX_ROUNDS = 64;

function arithmeticGeometricMean(a0: number, b0: number): number {
  if (b0 === 0) return 0;
  let a = a0;
  let b = b0;
  for (let round = 0; round < AGM_MAX_ROUNDS && Math.abs(a - b) > AGM_TOLERANCE * a; round++) {
    const next = (a + b) / 2;
    b = Math.sqrt(a * b);
    a = next;
  }
  return (a + b) / 2;
}
