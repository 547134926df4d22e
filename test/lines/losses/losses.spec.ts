import { expect } from 'chai';
import { complex, sqrt, divide } from 'mathjs';
import { calculate, FREE_SPACE_IMPEDANCE, SPEED_OF_LIGHT, VACUUM_PERMEABILITY } from '../../../projects/lines/src/public-api';
import { djordjevicSarkar } from '../../../projects/lines/src/dielectric/djordjevic-sarkar';
import { hammerstadBekkadalFactor, hurayFactor } from '../../../projects/lines/src/losses/roughness';
import { skinDepth } from '../../../projects/lines/src/losses/skin-effect';
import { expectClose } from '../expect-close';

/** The incremental-inductance rule is evaluated by a forward difference of relative step 1e-6. */
const DERIVATIVE_TOLERANCE = 1e-5;
const EXACT = 1e-12;
const copper = 5.8001e7;

describe('skin depth', () => {
  it('is δ = 1/√(πfμ0σ): about 2.09 µm in copper at 1 GHz (Pozar, Microwave Engineering, table of skin depths, "2.09 µm"; recalled)', () => {
    expectClose(skinDepth(1e9, copper), 1 / Math.sqrt(Math.PI * 1e9 * VACUUM_PERMEABILITY * copper), EXACT, 'formula');
    expectClose(skinDepth(1e9, copper), 2.09e-6, 0.005, 'copper at 1 GHz');
  });
});

describe('conductor loss by the incremental-inductance rule', () => {
  it('for coax equals αc = Rs/(2η)·(1/a + 1/b)/ln(b/a) (Pozar, Microwave Engineering, §2.7 example)', () => {
    const [d, D, er, f] = [1e-3, 3.5e-3, 2.25, 1e9];
    const result = calculate({ kind: 'coax', d, D, er, frequency: f, conductivity: copper });
    const rs = Math.sqrt((Math.PI * f * VACUUM_PERMEABILITY) / copper);
    const eta = FREE_SPACE_IMPEDANCE / Math.sqrt(er);
    const expected = (rs / (2 * eta)) * (2 / d + 2 / D) / Math.log(D / d);
    expectClose(result.alphaConductor!, expected, DERIVATIVE_TOLERANCE, 'alphaC');
  });

  it('for twin lead equals R = (2Rs/πd)·(s/d)/√((s/d)² − 1), proximity effect included (exact two-wire skin-effect result)', () => {
    const [d, s, f] = [1e-3, 3e-3, 1e8];
    const result = calculate({ kind: 'twin-lead', d, s, er: 1, frequency: f, conductivity: copper });
    const rs = Math.sqrt((Math.PI * f * VACUUM_PERMEABILITY) / copper);
    const x = s / d;
    expectClose(result.rPerMeter!, ((2 * rs) / (Math.PI * d)) * (x / Math.sqrt(x * x - 1)), DERIVATIVE_TOLERANCE, 'R');
  });

  it('rises as √f on a smooth conductor', () => {
    const spec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;
    // Dispersion changes z0 very slightly between the two frequencies, hence the 1 % tolerance.
    expectClose(calculate({ ...spec, frequency: 4e9 }).alphaConductor! / calculate({ ...spec, frequency: 1e9 }).alphaConductor!, 2, 0.01, 'ratio');
  });

  it('warns for t = 0 and for conductors thinner than 3 skin depths', () => {
    const spec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, er: 4.3, frequency: 1e6 } as const;
    expect(calculate({ ...spec, t: 0 }).warnings.join(' ')).to.contain('t = 0');
    expect(calculate({ ...spec, t: 17e-6 }).warnings.join(' ')).to.contain('skin depths');
  });
});

describe('roughness factors', () => {
  it('Hammerstad–Bekkadal runs from 1 (smooth) to 2 (very rough), and is 1 + (2/π)atan(1.4) at Δ = δ (Hammerstad–Bekkadal 1975)', () => {
    expectClose(hammerstadBekkadalFactor(0, 1e-6), 1, EXACT, 'smooth');
    expectClose(hammerstadBekkadalFactor(1e-3, 1e-6), 2, 1e-6, 'rough');
    expectClose(hammerstadBekkadalFactor(1e-6, 1e-6), 1 + (2 / Math.PI) * Math.atan(1.4), EXACT, 'Δ = δ');
  });

  it('Huray tends to 1 at low frequency and to 1 + 1.5·SR at high frequency (limits of the snowball formula)', () => {
    expectClose(hurayFactor(1, 0.5e-6, 2), 1, 1e-5, 'low f');
    expectClose(hurayFactor(1e-12, 0.5e-6, 2), 4, 1e-5, 'high f');
  });

  it('roughness raises the conductor loss', () => {
    const spec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3, frequency: 5e9 } as const;
    expect(calculate({ ...spec, roughness: 1e-6 }).alphaConductor!).to.be.above(calculate(spec).alphaConductor!);
    expect(calculate({ ...spec, roughnessModel: 'huray', noduleRadius: 0.5e-6, noduleSurfaceRatio: 1 }).alphaConductor!).to.be.above(calculate(spec).alphaConductor!);
  });
});

describe('dielectric loss', () => {
  it('in a homogeneous line is αd = π·f·√εr·tanδ/c0 (Pozar §2.7, TEM line)', () => {
    const result = calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 17e-6, er: 4, tanDelta: 0.02, frequency: 1e9 });
    expectClose(result.alphaDielectric!, (Math.PI * 1e9 * 2 * 0.02) / SPEED_OF_LIGHT, EXACT, 'alphaD');
  });

  it('is zero without a loss tangent, and so is the conductor loss for a near-perfect conductor: zc → z0', () => {
    const result = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25, frequency: 1e9, conductivity: 1e30 });
    expect(result.alphaDielectric).to.equal(0);
    expectClose(result.zc!.re, result.z0, 1e-9, 'zc.re');
    expect(Math.abs(result.zc!.im)).to.be.below(1e-6);
  });

  it('gives zc = √((R + jωL)/(G + jωC)) in agreement with mathjs complex arithmetic', () => {
    const r = calculate({ kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3, tanDelta: 0.02, frequency: 1e8 });
    const omega = 2 * Math.PI * 1e8;
    const expected = sqrt(divide(complex(r.rPerMeter!, omega * r.lPerMeter), complex(r.gPerMeter!, omega * r.cPerMeter)) as never) as unknown as { re: number; im: number };
    expectClose(r.zc!.re, expected.re, EXACT, 're');
    expectClose(r.zc!.im, expected.im, 1e-9, 'im');
  });

  it('totals over a length: delay, loss and electrical length (exact products)', () => {
    const r = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25, frequency: 1e9, length: 2 });
    expectClose(r.delay!, 2 * r.delayPerMeter, EXACT, 'delay');
    expectClose(r.lossDb!, 2 * r.lossDbPerMeter!, EXACT, 'lossDb');
    expectClose(r.electricalLengthDeg!, 360 * 1e9 * r.delay!, EXACT, 'deg');
  });
});

describe('Djordjevic–Sarkar wideband dielectric (2001)', () => {
  it('returns the measured Dk and Df at the reference frequency', () => {
    const at = djordjevicSarkar(4.3, 0.02, 1e9, 1e9);
    expectClose(at.er, 4.3, EXACT, 'Dk');
    expectClose(at.tanDelta, 0.02, EXACT, 'Df');
  });

  it('is causal in the usual sense: Dk falls with frequency and Df stays nearly flat across the band', () => {
    const low = djordjevicSarkar(4.3, 0.02, 1e9, 1e7);
    const high = djordjevicSarkar(4.3, 0.02, 1e9, 1e10);
    expect(low.er).to.be.above(4.3);
    expect(high.er).to.be.below(4.3);
    expectClose(high.tanDelta, 0.02, 0.15, 'Df flat');
  });

  it('feeds calculate(): erAtFrequency and tanDeltaAtFrequency are reported', () => {
    const r = calculate({ kind: 'stripline', w: 0.2e-3, b: 0.5e-3, t: 17e-6, er: 4.3, tanDelta: 0.02, frequency: 1e10, dielectricReferenceFrequency: 1e9 });
    expectClose(r.erEff, r.erAtFrequency!, EXACT, 'erEff');
    expect(r.erAtFrequency!).to.be.below(4.3);
  });
});

describe('microstrip dispersion (Kirschning–Jansen 1982, Jansen–Kirschning 1983)', () => {
  const spec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;

  it('tends to the static values as f → 0', () => {
    const r = calculate({ ...spec, frequency: 1 });
    const s = calculate(spec);
    expectClose(r.erEff, s.erEff, 1e-9, 'erEff');
    expectClose(r.z0, s.z0, 1e-9, 'z0');
  });

  it('εeff rises monotonically with frequency towards εr', () => {
    let previous = calculate(spec).erEff;
    for (const f of [1e9, 5e9, 20e9, 60e9, 200e9]) {
      const erEff = calculate({ ...spec, frequency: f }).erEff;
      expect(erEff).to.be.above(previous).and.below(spec.er);
      previous = erEff;
    }
  });

  it('warns beyond h/λ0 = 0.13', () => {
    expect(calculate({ ...spec, frequency: 300e9 }).warnings.join(' ')).to.contain('h/λ0');
  });
});
