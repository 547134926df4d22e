/**
 * Bracketed scalar root finding.
 */

/** Iteration cap: Brent converges in well under 100 steps on any bracket in double precision. */
const MAX_ITERATIONS = 100;

/**
 * A root of f in [a, b], given f(a) and f(b) of opposite sign.
 * Method: Brent 1973 (R. P. Brent, Algorithms for Minimization without Derivatives, ch. 4):
 *   inverse quadratic interpolation and secant steps, falling back to bisection.
 * Valid:  f continuous on [a, b]; stops when the bracket is below `tolerance` (absolute, in x).
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tolerance: number): { x: number; iterations: number } {
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + tolerance / 2;
    const m = (c - b) / 2;
    if (Math.abs(m) <= tol || fb === 0) return { x: b, iterations: iteration };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const r = fb / fc;
        const t = fa / fc;
        p = s * (2 * m * t * (t - r) - (b - a) * (r - 1));
        q = (t - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return { x: b, iterations: MAX_ITERATIONS };
}
