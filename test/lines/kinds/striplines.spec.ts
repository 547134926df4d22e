import ellipk from '@stdlib/math-base-special-ellipk';
import { expect } from 'chai';
import { calculate, FREE_SPACE_IMPEDANCE, LineInputError } from '../../../projects/lines/src/public-api';
import { cohnFringingCapacitance, cohnStripline, wheelerStripline } from '../../../projects/lines/src/kinds/stripline-formulas';
import { expectClose } from '../expect-close';

const EXACT = 1e-11;
/** Wheeler 1978 claims 0.5 % against the exact solution (recalled). */
const WHEELER_CLAIM = 0.005;

/** Cohn 1954 (REFERENCES.md form) evaluated with the stdlib-js ellipk routine, independent of the library's AGM. */
function cohnByStdlib(w: number, b: number, er: number): number {
  const k = 1 / Math.cosh((Math.PI * w) / (2 * b));
  return (FREE_SPACE_IMPEDANCE / (4 * Math.sqrt(er))) * (ellipk(k * k) / ellipk(1 - k * k));
}

describe('stripline, zero thickness (Cohn 1954, exact)', () => {
  it('equals η0/(4√εr)·K(k)/K(k′), k = sech(πw/2b), computed with stdlib-js ellipk', () => {
    for (const w of [0.05e-3, 0.2e-3, 0.5e-3, 2e-3]) {
      expectClose(calculate({ kind: 'stripline', w, b: 0.5e-3, t: 0, er: 4 }).z0, cohnByStdlib(w, 0.5e-3, 4), EXACT, `w=${w}`);
    }
  });

  it('tends to η0·b/(4w√εr) for a wide strip and grows without bound for a narrow one (exact limits)', () => {
    const b = 1e-3;
    const w = 20 * b;
    // Fringing adds 2·(2 ln2/π)·b/… of effective width: ~2 % at w/b = 20, falling as 1/w.
    expectClose(cohnStripline(w, b, 1), (FREE_SPACE_IMPEDANCE * b) / (4 * w), 0.03, 'wide');
    expect(cohnStripline(b * 1e-4, b, 1)).to.be.above(cohnStripline(b * 1e-3, b, 1) + 100);
  });
});

describe('stripline, finite thickness (Wheeler 1978)', () => {
  it('agrees with Cohn’s exact t = 0 result within Wheeler’s claimed 0.5 % as t → 0', () => {
    for (const ratio of [0.05, 0.2, 0.5, 1, 2, 5]) {
      expectClose(wheelerStripline(ratio, 1, 1e-9, 1), cohnStripline(ratio, 1, 1), WHEELER_CLAIM, `w/b=${ratio}`);
    }
  });

  it('a thicker strip lowers z0', () => {
    const thin = calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 5e-6, er: 4 });
    const thick = calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 35e-6, er: 4 });
    expect(thick.z0).to.be.below(thin.z0);
  });

  it('is homogeneous: εeff = εr, delay = √εr/c0', () => {
    expect(calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 17e-6, er: 4 }).erEff).to.equal(4);
  });

  it('throws LineInputError for t ≥ b', () => {
    expect(() => calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 0.5e-3, er: 4 })).to.throw(LineInputError).with.property('field', 't');
  });

  it('the IPC-2141 method is within 5 % of the accurate model inside its range (IPC claims a few per cent)', () => {
    const spec = { kind: 'stripline', w: 0.15e-3, b: 0.6e-3, t: 17e-6, er: 4 } as const;
    expectClose(calculate({ ...spec, method: 'ipc-2141' }).z0, calculate(spec).z0, 0.05, 'ipc');
  });
});

describe('Cohn fringing capacitance', () => {
  it('is 2·ln2/π = 0.4413 for a zero-thickness strip (Cohn 1954)', () => {
    expectClose(cohnFringingCapacitance(0, 1), (2 * Math.LN2) / Math.PI, EXACT, "C'f");
  });
});

describe('offset stripline (parallel combination)', () => {
  it('equals the centred stripline exactly when h1 = h2 (b = 2h + t)', () => {
    const offset = calculate({ kind: 'offset-stripline', w: 0.2e-3, h1: 0.2e-3, h2: 0.2e-3, t: 17e-6, er: 4 });
    const centred = calculate({ kind: 'stripline', w: 0.2e-3, b: 0.417e-3, t: 17e-6, er: 4 });
    expectClose(offset.z0, centred.z0, EXACT, 'z0');
  });

  it('moving the strip towards one plane lowers z0, and strong asymmetry warns', () => {
    const centred = calculate({ kind: 'offset-stripline', w: 0.2e-3, h1: 0.3e-3, h2: 0.3e-3, t: 17e-6, er: 4 });
    const offset = calculate({ kind: 'offset-stripline', w: 0.2e-3, h1: 0.1e-3, h2: 0.5e-3, t: 17e-6, er: 4 });
    expect(offset.z0).to.be.below(centred.z0);
    expect(offset.warnings.join(' ')).to.contain('h2/h1');
  });
});

describe('coupled stripline (Cohn 1955)', () => {
  it('matches Cohn’s even/odd formulas with stdlib-js ellipk at t = 0', () => {
    const [w, s, b, er] = [0.15e-3, 0.2e-3, 0.5e-3, 4];
    const result = calculate({ kind: 'coupled-stripline', w, s, b, t: 0, er });
    const ke = Math.tanh((Math.PI * w) / (2 * b)) * Math.tanh((Math.PI * (w + s)) / (2 * b));
    const ko = Math.tanh((Math.PI * w) / (2 * b)) / Math.tanh((Math.PI * (w + s)) / (2 * b));
    const z = (k: number) => (FREE_SPACE_IMPEDANCE / (4 * Math.sqrt(er))) * (ellipk(1 - k * k) / ellipk(k * k));
    expectClose(result.zEven!, z(ke), EXACT, 'zEven');
    expectClose(result.zOdd!, z(ko), EXACT, 'zOdd');
    expectClose(result.zDiff!, 2 * result.zOdd!, EXACT, 'zDiff');
    expectClose(result.zCommon!, result.zEven! / 2, EXACT, 'zCommon');
    expectClose(result.z0, Math.sqrt(result.zEven! * result.zOdd!), EXACT, 'z0');
  });

  it('when the gap grows, zOdd and zEven approach the single stripline (with and without thickness)', () => {
    for (const t of [0, 17e-6]) {
      const pair = calculate({ kind: 'coupled-stripline', w: 0.15e-3, s: 5e-3, b: 0.5e-3, t, er: 4 });
      const single = calculate({ kind: 'stripline', w: 0.15e-3, b: 0.5e-3, t, er: 4 });
      expectClose(pair.zOdd!, single.z0, 1e-6, `zOdd t=${t}`);
      expectClose(pair.zEven!, single.z0, 1e-6, `zEven t=${t}`);
    }
  });

  it('has zOdd < z0 < zEven for a close pair', () => {
    const pair = calculate({ kind: 'coupled-stripline', w: 0.15e-3, s: 0.1e-3, b: 0.5e-3, t: 17e-6, er: 4 });
    expect(pair.zOdd!).to.be.below(pair.z0);
    expect(pair.zEven!).to.be.above(pair.z0);
  });
});
