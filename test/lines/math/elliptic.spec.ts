import ellipk from '@stdlib/math-base-special-ellipk';
import { ellipticK, ellipticRatio } from '../../../projects/lines/src/math/elliptic';
import { expectClose } from '../expect-close';

/** Near k = 1, forming m = k² for stdlib loses a few digits of 1 − m, so agreement is to ~1e-12. */
const MACHINE = 1e-12;

describe('complete elliptic integral K(k)', () => {
  it('agrees with the stdlib-js ellipk routine (parameter m = k²) across 0 ≤ k < 1', () => {
    for (const k of [0, 0.01, 0.2, 0.5, 0.7071067811865476, 0.9, 0.99, 0.999999]) {
      expectClose(ellipticK(k), ellipk(k * k), MACHINE, `K(${k})`);
    }
  });

  it('K(0) = π/2 exactly (A&S 17.3.11)', () => {
    expectClose(ellipticK(0), Math.PI / 2, MACHINE, 'K(0)');
  });

  it('ratio K(k)/K(k′) is 1 at k = 1/√2 and matches stdlib-js elsewhere', () => {
    expectClose(ellipticRatio(Math.SQRT1_2), 1, MACHINE, 'ratio at 1/√2');
    for (const k of [0.05, 0.3, 0.8, 0.995]) {
      expectClose(ellipticRatio(k), ellipk(k * k) / ellipk(1 - k * k), 1e-12, `ratio(${k})`);
    }
  });
});
