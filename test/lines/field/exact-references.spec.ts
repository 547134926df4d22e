import ellipk from '@stdlib/math-base-special-ellipk';
import { expectClose } from '../expect-close';
import { cohnCoupledStripline, cohnStripline, ellipticKByAgm, ETA0 } from './exact-references';

/**
 * Two double-precision routines for the same integral agree to rounding, amplified
 * near k → 1 where a rounding of m = k² grows by 1/(1 − m) (≈ 5e5 at k = 0.999999).
 */
const ROUNDING = 1e-11;

describe('exact references used by the field-solver tests', () => {
  it('K(k) by the AGM agrees with stdlib-js ellipk, whose argument is the parameter m = k²', () => {
    for (const k of [0, 0.1, 0.5, 0.9, 0.999, 0.999999]) expectClose(ellipticKByAgm(k), ellipk(k * k), ROUNDING, `K(${k})`);
  });

  it('Cohn stripline tends to the parallel-plate limit η0·b/(4w√εr) for a wide strip (Cohn 1954; fringing adds (b/π)·ln 4 to the width)', () => {
    const b = 1;
    const w = 20;
    // With K(k) → ln(4/k′) as k′ = sech(πw/2b) → 0 (Abramowitz & Stegun 17.3.26) and K(k′) → π/2, the ratio is π/2 / (πw/2b + ln 2).
    const fringed = (ETA0 * b) / (4 * (w + ((2 * b) / Math.PI) * Math.log(2)));
    expectClose(cohnStripline(w, b, 1), fringed, 1e-9, 'Z0');
  });

  it('Cohn coupled stripline tends to the single stripline as the gap grows (Cohn 1955)', () => {
    const single = cohnStripline(0.5, 1, 4);
    const far = cohnCoupledStripline(0.5, 8, 1, 4);
    expectClose(far.zEven, single, 1e-9, 'zEven');
    expectClose(far.zOdd, single, 1e-9, 'zOdd');
  });
});
