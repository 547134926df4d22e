import { expect } from 'chai';
import { calculate, FREE_SPACE_IMPEDANCE, LineInputError, SPEED_OF_LIGHT } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const EXACT = 1e-12;

describe('coax (exact TEM)', () => {
  it('gives Z0 = η0/(2π√εr)·ln(D/d) (Pozar, Microwave Engineering, 4th ed., §2.2 / §3.4)', () => {
    const result = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25 });
    expectClose(result.z0, (FREE_SPACE_IMPEDANCE / (2 * Math.PI * 1.5)) * Math.log(3.5), EXACT, 'z0');
  });

  it('with solid polyethylene (εr = 2.25) has velocity factor 0.667 (common practice, no source: "≈ 0.66")', () => {
    expectClose(calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25 }).velocityFactor, 1 / 1.5, EXACT, 'vf');
  });

  it('gives the TE11 cut-off c0/(π·(a + b)·√εr) (Pozar §3.4 approximation)', () => {
    const result = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25 });
    expectClose(result.cutoffFrequency!, SPEED_OF_LIGHT / (Math.PI * 2.25e-3 * 1.5), EXACT, 'fc');
  });

  it('warns above the TE11 cut-off', () => {
    const result = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25, frequency: 60e9 });
    expect(result.warnings.join(' ')).to.contain('TE11');
  });

  it('with a dielectric strength gives Vpeak = Emax·a·ln(b/a), P = Vpeak²/(2Z0) and a safety caution', () => {
    const result = calculate({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25, dielectricStrength: 20e6 });
    const peak = 20e6 * 0.5e-3 * Math.log(3.5);
    expectClose(result.peakVoltage!, peak, EXACT, 'Vpeak');
    expectClose(result.maxPower!, (peak * peak) / (2 * result.z0), EXACT, 'P');
    expect(result.warnings.join(' ')).to.contain('follow local codes and licensed practice');
  });

  it('throws LineInputError for D ≤ d and a non-positive dielectric strength', () => {
    expect(() => calculate({ kind: 'coax', d: 2e-3, D: 2e-3, er: 2.25 })).to.throw(LineInputError).with.property('field', 'D');
    expect(() => calculate({ kind: 'coax', d: 1e-3, D: 3e-3, er: 2.25, dielectricStrength: 0 })).to.throw(LineInputError).with.property('field', 'dielectricStrength');
  });
});

describe('twin lead (exact TEM)', () => {
  it('is exact for every εr: Z0 = η0/(π√εr)·acosh(s/d)', () => {
    for (const er of [1, 1.5, 2.25, 4, 10, 80]) {
      expectClose(calculate({ kind: 'twin-lead', d: 1e-3, s: 6.5e-3, er }).z0, (FREE_SPACE_IMPEDANCE / (Math.PI * Math.sqrt(er))) * Math.acosh(6.5), EXACT, `er=${er}`);
    }
  });

  it('reaches the common 300 Ω in air near s/d = 6.2 (common practice, no source: "300 Ω twin lead")', () => {
    expectClose(calculate({ kind: 'twin-lead', d: 1e-3, s: 6.2e-3, er: 1 }).z0, 300, 0.01, 'z0');
  });

  it('throws LineInputError for s ≤ d', () => {
    expect(() => calculate({ kind: 'twin-lead', d: 1e-3, s: 1e-3, er: 1 })).to.throw(LineInputError).with.property('field', 's');
  });
});

describe('wire over ground (exact TEM, method of images)', () => {
  it('is half the twin lead of spacing 2h: Z0 = η0/(2π√εr)·acosh(2h/d)', () => {
    const wire = calculate({ kind: 'wire-over-ground', d: 1e-3, h: 3e-3, er: 2 });
    const pair = calculate({ kind: 'twin-lead', d: 1e-3, s: 6e-3, er: 2 });
    expectClose(wire.z0, pair.z0 / 2, EXACT, 'z0');
  });

  it('throws LineInputError when the wire touches the plane (2h ≤ d)', () => {
    expect(() => calculate({ kind: 'wire-over-ground', d: 2e-3, h: 1e-3, er: 1 })).to.throw(LineInputError).with.property('field', 'h');
  });
});

describe('twisted pair (Lefferson 1971)', () => {
  it('untwisted, fills a quarter of the field region: εeff = 1 + 0.25(εr − 1) (Lefferson, recalled from memory)', () => {
    const result = calculate({ kind: 'twisted-pair', d: 0.5e-3, s: 0.9e-3, twistsPerMeter: 0, er: 3 });
    expectClose(result.erEff, 1.5, EXACT, 'erEff');
    expectClose(result.z0, (FREE_SPACE_IMPEDANCE / (Math.PI * Math.sqrt(1.5))) * Math.acosh(1.8), EXACT, 'z0');
  });

  it('more twists raise εeff and lower z0', () => {
    const loose = calculate({ kind: 'twisted-pair', d: 0.5e-3, s: 0.9e-3, twistsPerMeter: 20, er: 3 });
    const tight = calculate({ kind: 'twisted-pair', d: 0.5e-3, s: 0.9e-3, twistsPerMeter: 200, er: 3 });
    expect(tight.erEff).to.be.above(loose.erEff);
    expect(tight.z0).to.be.below(loose.z0);
  });

  it('warns beyond a 45° twist angle', () => {
    const result = calculate({ kind: 'twisted-pair', d: 0.5e-3, s: 0.9e-3, twistsPerMeter: 1000, er: 3 });
    expect(result.warnings.join(' ')).to.contain('twist angle');
  });

  it('throws LineInputError for s ≤ d and negative twists', () => {
    expect(() => calculate({ kind: 'twisted-pair', d: 1e-3, s: 0.9e-3, twistsPerMeter: 10, er: 3 })).to.throw(LineInputError).with.property('field', 's');
    expect(() => calculate({ kind: 'twisted-pair', d: 0.5e-3, s: 0.9e-3, twistsPerMeter: -1, er: 3 })).to.throw(LineInputError).with.property('field', 'twistsPerMeter');
  });
});
