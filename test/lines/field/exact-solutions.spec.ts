import { crossSectionFromSpec, fieldSolve, fieldSolveLine } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';
import { coaxExact, cohnCoupledStripline, cohnStripline, twinLeadExact, wireOverGroundExact } from './exact-references';

/** Field solves take up to a few seconds each; mocha's 2 s default is for unit tests. */
const SOLVE_TIMEOUT = 30_000;

/** The accuracy the issue asks of the solver against exact TEM results. */
const EXACT_TOLERANCE = 0.005;
const mm = 1e-3;

describe('field solver against exact TEM results', function () {
  this.timeout(SOLVE_TIMEOUT);
  for (const w of [0.1, 0.4, 1, 2.5]) {
    it(`zero-thickness stripline, w/b = ${w}, is within 0.5 % of Cohn's elliptic-integral result (IRE Trans. MTT-2, 1954)`, async () => {
      const b = 0.5 * mm;
      const result = await fieldSolveLine({ kind: 'stripline', w: w * b, b, t: 0, er: 4.4 });
      expectClose(result.z0, cohnStripline(w * b, b, 4.4), EXACT_TOLERANCE, 'z0');
      expectClose(result.erEff, 4.4, 1e-12, 'erEff');
    });
  }

  for (const [w, s] of [
    [0.3, 0.2],
    [0.5, 0.5],
    [1, 0.1],
  ] as const) {
    it(`zero-thickness coupled stripline, w/b = ${w}, s/b = ${s}, gives zOdd and zEven within 0.5 % of Cohn (IRE Trans. MTT-3, 1955)`, async () => {
      const b = 0.4 * mm;
      const result = await fieldSolveLine({ kind: 'coupled-stripline', w: w * b, s: s * b, b, t: 0, er: 3.5 });
      const exact = cohnCoupledStripline(w * b, s * b, b, 3.5);
      expectClose(result.zOdd!, exact.zOdd, EXACT_TOLERANCE, 'zOdd');
      expectClose(result.zEven!, exact.zEven, EXACT_TOLERANCE, 'zEven');
      expectClose(result.zDiff!, 2 * exact.zOdd, EXACT_TOLERANCE, 'zDiff');
    });
  }

  for (const ratio of [1.5, 3.3, 10]) {
    it(`coax with D/d = ${ratio} is within 0.5 % of η0/(2π√εr)·ln(D/d) (Pozar §3.4)`, async () => {
      const d = 0.5 * mm;
      const result = await fieldSolveLine({ kind: 'coax', d, D: ratio * d, er: 2.25 });
      expectClose(result.z0, coaxExact(d, ratio * d, 2.25), EXACT_TOLERANCE, 'z0');
    });
  }

  for (const ratio of [1.25, 3, 8]) {
    it(`twin lead with s/d = ${ratio} in open space is within 0.5 % of η0/(π√εr)·acosh(s/d)`, async () => {
      const d = 1 * mm;
      const result = await fieldSolveLine({ kind: 'twin-lead', d, s: ratio * d, er: 1 });
      expectClose(result.z0, twinLeadExact(d, ratio * d, 1), EXACT_TOLERANCE, 'z0');
    });
  }

  for (const ratio of [0.75, 2, 5]) {
    it(`wire over ground with h/d = ${ratio} is within 0.5 % of η0/(2π√εr)·acosh(2h/d)`, async () => {
      const d = 1 * mm;
      const result = await fieldSolveLine({ kind: 'wire-over-ground', d, h: ratio * d, er: 2.1 });
      expectClose(result.z0, wireOverGroundExact(d, ratio * d, 2.1), EXACT_TOLERANCE, 'z0');
    });
  }

  it('zero-thickness stripline on a core/prepreg interface has εeff = (εr1 + εr2)/2 exactly (by symmetry Ey = 0 on the mid-plane off the strip)', async () => {
    const b = 0.5 * mm;
    const spec = { kind: 'stripline', w: 0.2 * mm, b, t: 0, er: 3.6 } as const;
    const result = await fieldSolve(crossSectionFromSpec(spec, { erAbove: 4.4 }));
    expectClose(result.erEff, 4, 1e-6, 'erEff');
    expectClose(result.z0, cohnStripline(0.2 * mm, b, 4), EXACT_TOLERANCE, 'z0');
  });
});
