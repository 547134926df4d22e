import { expect } from 'chai';
import { calculate, FREE_SPACE_IMPEDANCE, LineInputError } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const EXACT = 1e-12;

describe('coplanar waveguide (Wen 1969 / Ghione–Naldi)', () => {
  it('in air with k = w/(w + 2g) = 1/√2 has K(k) = K(k′), so Z0 = η0/4 exactly (Wen 1969 conformal mapping)', () => {
    const g = 1e-3;
    const w = (2 * g) / (Math.SQRT2 - 1); // w/(w + 2g) = 1/√2
    const result = calculate({ kind: 'cpw', w, g, h: 1e-3, t: 0, er: 1 });
    expectClose(result.erEff, 1, EXACT, 'erEff');
    expectClose(result.z0, FREE_SPACE_IMPEDANCE / 4, 1e-12, 'z0');
  });

  it('on a very thick substrate has εeff = (εr + 1)/2 exactly (Wen 1969)', () => {
    const result = calculate({ kind: 'cpw', w: 0.3e-3, g: 0.15e-3, h: 1, t: 0, er: 9.8 });
    // h = 1 m is 3000 gaps deep: the substrate term has converged to ~1e-8.
    expectClose(result.erEff, 5.4, 1e-7, 'erEff');
  });

  it('conductor-backed on a thick substrate tends to the open CPW; on a thin one its z0 is lower', () => {
    const spec = { kind: 'cpw', w: 0.3e-3, g: 0.15e-3, t: 0, er: 4.3 } as const;
    expectClose(calculate({ ...spec, h: 0.1, grounded: true }).z0, calculate({ ...spec, h: 0.1 }).z0, 1e-5, 'thick');
    expect(calculate({ ...spec, h: 0.2e-3, grounded: true }).z0).to.be.below(calculate({ ...spec, h: 0.2e-3 }).z0);
  });

  it('a finite strip thickness lowers z0 and εeff (Gupta et al. 1996, ch. 7)', () => {
    const spec = { kind: 'cpw', w: 0.3e-3, g: 0.15e-3, h: 0.5e-3, er: 4.3 } as const;
    const thin = calculate({ ...spec, t: 0 });
    const thick = calculate({ ...spec, t: 35e-6 });
    expect(thick.z0).to.be.below(thin.z0);
    expect(thick.erEff).to.be.below(thin.erEff);
  });

  it('throws LineInputError for a zero gap and a non-boolean grounded', () => {
    expect(() => calculate({ kind: 'cpw', w: 0.3e-3, g: 0, h: 0.5e-3, t: 0, er: 4.3 })).to.throw(LineInputError).with.property('field', 'g');
    expect(() => calculate({ kind: 'cpw', w: 0.3e-3, g: 0.1e-3, h: 0.5e-3, t: 0, er: 4.3, grounded: 'yes' as unknown as boolean })).to.throw(LineInputError).with.property('field', 'grounded');
  });
});

describe('coupled microstrip (Kirschning–Jansen 1984)', () => {
  const pair = { kind: 'coupled-microstrip', w: 0.2e-3, s: 0.2e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;

  it('when the gap grows, zOdd, zEven and both εeff approach the single microstrip', () => {
    const far = calculate({ ...pair, s: 50 * pair.h });
    const single = calculate({ kind: 'microstrip', w: pair.w, h: pair.h, t: pair.t, er: pair.er });
    // The coupling terms fall off as a power of s/h (Q2 ~ g^2.31), so at s = 50h a few 1e-4 remain.
    expectClose(far.zOdd!, single.z0, 1e-3, 'zOdd');
    expectClose(far.zEven!, single.z0, 1e-3, 'zEven');
    expectClose(far.erEffOdd!, single.erEff, 1e-3, 'erEffOdd');
    expectClose(far.erEffEven!, single.erEff, 1e-3, 'erEffEven');
  });

  it('has zOdd < zEven and εeff,odd < εeff,even for a close pair (odd mode has more field in air)', () => {
    const result = calculate(pair);
    expect(result.zOdd!).to.be.below(result.zEven!);
    expect(result.erEffOdd!).to.be.below(result.erEffEven!);
  });

  it('a narrower gap lowers zDiff', () => {
    expect(calculate({ ...pair, s: 0.1e-3 }).zDiff!).to.be.below(calculate(pair).zDiff!);
  });

  it('in air both modes have εeff = 1 exactly', () => {
    const result = calculate({ ...pair, er: 1 });
    expectClose(result.erEffOdd!, 1, EXACT, 'odd');
    expectClose(result.erEffEven!, 1, EXACT, 'even');
  });
});

describe('embedded microstrip (Hammerstad–Jensen with a cover correction)', () => {
  const base = { kind: 'embedded-microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;
  const surface = calculate({ kind: 'microstrip', w: base.w, h: base.h, t: base.t, er: base.er });

  it('with no cover, or a cover of air, equals the surface microstrip exactly', () => {
    expectClose(calculate({ ...base, cover: 0 }).z0, surface.z0, EXACT, 'no cover');
    expectClose(calculate({ ...base, cover: 1e-3, erCover: 1 }).z0, surface.z0, EXACT, 'air cover');
  });

  it('under a very thick cover of the substrate material is homogeneous: εeff → εr', () => {
    expectClose(calculate({ ...base, cover: 100 * base.h }).erEff, base.er, 1e-9, 'erEff');
  });

  it('a solder-mask-like cover lowers z0 by a few ohms (common practice, no source: "1–3 Ω on 50 Ω")', () => {
    const drop = surface.z0 - calculate({ ...base, cover: 20e-6, erCover: 3.5 }).z0;
    expect(drop).to.be.within(0.5, 4);
  });

  it('throws LineInputError for a negative cover and erCover < 1', () => {
    expect(() => calculate({ ...base, cover: -1e-6 })).to.throw(LineInputError).with.property('field', 'cover');
    expect(() => calculate({ ...base, cover: 1e-6, erCover: 0.5 })).to.throw(LineInputError).with.property('field', 'erCover');
  });
});
