import { expect } from 'chai';
import { erf } from 'mathjs';
import { edge, edgeSigma, erfc, riseTimeOfSigma } from '../../../projects/lines/src/transient/edge';
import { inverseFft } from '../../../projects/lines/src/transient/fft';
import { expectClose } from '../expect-close';

/** erfc is written to 1e-14 absolute; mathjs's erf (W. J. Cody's rational approximations) is good to ~1e-15. */
const ERF_TOLERANCE = 1e-13;

describe('transient edge', () => {
  describe('erfc', () => {
    it('matches 1 − erf from mathjs (a general-purpose reference library) across −6 … 6', () => {
      for (let x = -6; x <= 6; x += 0.05) {
        expect(Math.abs(erfc(x) - (1 - erf(x))), `x = ${x}`).to.be.below(ERF_TOLERANCE);
      }
    });

    it('at 0.5 equals 1 − 0.5204998778, the erf value of Abramowitz & Stegun Table 7.1 (recalled from memory, not checked against the text; agrees with mathjs above)', () => {
      expectClose(erfc(0.5), 1 - 0.5204998778, 1e-9);
    });
  });

  describe('edge', () => {
    it('rises 10–90 % in exactly the rise time it was built for (definition of the 10–90 % time)', () => {
      const riseTime = 1e-9;
      const sigma = edgeSigma(riseTime);
      const timeAt = (level: number) => {
        let lo = -10 * sigma;
        let hi = 10 * sigma;
        for (let i = 0; i < 200; i++) {
          const mid = (lo + hi) / 2;
          if (edge(mid, sigma) < level) lo = mid;
          else hi = mid;
        }
        return lo;
      };
      expectClose(timeAt(0.9) - timeAt(0.1), riseTime, 1e-12);
      expectClose(riseTimeOfSigma(sigma), riseTime, 1e-15);
    });

    it('equals Φ(t/σ) = ½(1 + erf(t/(σ√2))) from mathjs to 1e-11 everywhere (its table interpolation error)', () => {
      for (let x = -9; x <= 9; x += 0.00917) {
        expect(Math.abs(edge(x * 1e-10, 1e-10) - 0.5 * (1 + erf(x / Math.SQRT2))), `x = ${x}`).to.be.below(1e-11);
      }
    });

    it('is 50 % at t = 0 and an ideal step when σ = 0', () => {
      expect(Math.abs(edge(0, 1e-12) - 0.5)).to.be.below(1e-15);
      expect(edge(-1e-15, 0)).to.equal(0);
      expect(edge(0, 0)).to.equal(1);
    });
  });

  describe('inverseFft', () => {
    it('equals the inverse DFT sum (1/N)·Σ X[k]e^(2πjkn/N) evaluated directly (definition)', () => {
      const n = 16;
      const re = Float64Array.from({ length: n }, (_, k) => Math.cos(k) + 0.1 * k);
      const im = Float64Array.from({ length: n }, (_, k) => Math.sin(3 * k));
      const direct = Array.from({ length: n }, (_, m) => {
        let sr = 0;
        let si = 0;
        for (let k = 0; k < n; k++) {
          const a = (2 * Math.PI * k * m) / n;
          sr += re[k] * Math.cos(a) - im[k] * Math.sin(a);
          si += re[k] * Math.sin(a) + im[k] * Math.cos(a);
        }
        return { re: sr / n, im: si / n };
      });
      inverseFft(re, im);
      for (let m = 0; m < n; m++) {
        expect(Math.abs(re[m] - direct[m].re)).to.be.below(1e-14);
        expect(Math.abs(im[m] - direct[m].im)).to.be.below(1e-14);
      }
    });

    it('refuses a length that is not a power of two', () => {
      expect(() => inverseFft(new Float64Array(12), new Float64Array(12))).to.throw(RangeError);
    });
  });
});
