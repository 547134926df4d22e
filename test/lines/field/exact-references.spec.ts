import ellipk from '@stdlib/math-base-special-ellipk';
import { expectClose } from '../expect-close';
import { cohnCoupledStripline, cohnStripline, ellipticKByAgm, ETA0 } from './exact-references';

/** Two double-precision routines for the same integral agree to rounding. */
const ROUNDING = 1e-13;

describe('exact references used by the field-solver tests', () => {
  it('K(k) by the AGM agrees with stdlib-js ellipk, whose argument is the parameter m = k²', () => {
    for (const k of [0, 0.1, 0.5, 0.9, 0.999, 0.999999]) expectClose(ellipticKByAgm(k), ellipk(k * k), ROUNDING, `K(${k})`);
  });

  it('Cohn stripline tends to the parallel-plate limit η0·b/(4w√εr) for a wide strip (Cohn 1954; fringing adds (b/π)·ln 4 to the width)', () => {
    const b = 1;
    const w = 20;
    // Wide-strip limit with Cohn's fringe term: 2 plates of width w + (2b/π)·ln 2 each side, recalled from memory, not checked against the text.
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
