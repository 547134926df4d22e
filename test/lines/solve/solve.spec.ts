import { expect } from 'chai';
import { calculate, LineInputError, solve, sweep, tolerance, type LineSpec } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const ROUND_TRIP = 1e-7;

const microstrip = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;
const pair = { kind: 'coupled-microstrip', w: 0.2e-3, s: 0.2e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 } as const;

describe('solve', () => {
  it('solve(calculate(x)) returns x for w, h, er of a microstrip and s of a pair', () => {
    const cases: [LineSpec, string, 'z0' | 'zDiff' | 'delayPerMeter'][] = [
      [microstrip, 'w', 'z0'],
      [microstrip, 'h', 'z0'],
      [microstrip, 'er', 'delayPerMeter'],
      [pair, 's', 'zDiff'],
      [{ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25 }, 'd', 'z0'],
    ];
    for (const [spec, unknown, quantity] of cases) {
      const truth = (spec as unknown as Record<string, number>)[unknown];
      const value = calculate(spec)[quantity]!;
      const start = { ...spec, [unknown]: truth * 1.7 } as LineSpec;
      const solved = solve(start, unknown, { quantity, value });
      expectClose(solved.value, truth, ROUND_TRIP, `${spec.kind}.${unknown}`);
      expectClose(solved.result[quantity]!, value, 1e-9, 'result');
      expect((solved.spec as unknown as Record<string, number>)[unknown]).to.equal(solved.value);
    }
  });

  it('skips impossible inputs in the range (coax d ≥ D) and still finds the root', () => {
    const solved = solve({ kind: 'coax', d: 1e-3, D: 3.5e-3, er: 2.25 }, 'd', { quantity: 'z0', value: 75 }, { min: 1e-4, max: 1e-2 });
    expectClose(solved.result.z0, 75, 1e-9, 'z0');
  });

  it('throws LineInputError naming the unknown, with the reachable range, when the target is out of reach', () => {
    expect(() => solve(microstrip, 'w', { quantity: 'z0', value: 500 }))
      .to.throw(LineInputError, /reachable z0 is/)
      .with.property('field', 'w');
  });

  it('throws LineInputError for an unknown field, an output the kind lacks, and a bad range', () => {
    expect(() => solve(microstrip, 'x', { quantity: 'z0', value: 50 })).to.throw(LineInputError).with.property('field', 'x');
    expect(() => solve(microstrip, 'w', { quantity: 'zDiff', value: 100 })).to.throw(LineInputError).with.property('field', 'quantity');
    expect(() => solve(microstrip, 'w', { quantity: 'z0', value: 50 }, { min: 2, max: 1 })).to.throw(LineInputError).with.property('field', 'max');
  });
});

describe('sweep', () => {
  it('gives points evenly spaced from `from` to `to`, with a result and chart series per point', () => {
    const result = sweep(microstrip, 'w', 0.1e-3, 0.5e-3, 5);
    expect(result.x).to.have.length(5);
    expectClose(result.x[2], 0.3e-3, 1e-12, 'middle');
    expectClose(result.series.z0[2], calculate(microstrip).z0, 1e-12, 'z0');
    expect(result.series.z0[0]).to.be.above(result.series.z0[4]);
  });

  it('sweeps frequency in log spacing and adds the loss series', () => {
    const result = sweep({ ...microstrip, frequency: 1e9 }, 'frequency', 1e8, 1e10, 3, { spacing: 'log' });
    expectClose(result.x[1], 1e9, 1e-12, 'log middle');
    expect(result.series.lossDbPerMeter).to.have.length(3);
  });

  it('adds zDiff for coupled kinds', () => {
    expect(sweep(pair, 's', 0.1e-3, 0.4e-3, 4).series.zDiff).to.have.length(4);
  });

  it('throws LineInputError for points outside 2…10 000 and an unknown field', () => {
    expect(() => sweep(microstrip, 'w', 0.1e-3, 0.5e-3, 1)).to.throw(LineInputError).with.property('field', 'points');
    expect(() => sweep(microstrip, 'w', 0.1e-3, 0.5e-3, 10_001)).to.throw(LineInputError).with.property('field', 'points');
    expect(() => sweep(microstrip, 'b', 0.1e-3, 0.5e-3, 10)).to.throw(LineInputError).with.property('field', 'b');
  });
});

describe('tolerance', () => {
  const spreads = { w: { plusMinus: 25.4e-6 }, h: { plusMinusRelative: 0.1 }, er: { plusMinusRelative: 0.05 } };

  it('repeats exactly for the same randomState and differs for another', () => {
    const a = tolerance(microstrip, spreads, 500, { randomState: 42 });
    const b = tolerance(microstrip, spreads, 500, { randomState: 42 });
    const c = tolerance(microstrip, spreads, 500, { randomState: 43 });
    expect(a.impedance.mean).to.equal(b.impedance.mean);
    expect(a.impedance.mean).to.not.equal(c.impedance.mean);
  });

  it('has a mean near nominal, every sample inside the worst-case corners, and histogram counts summing to the samples', () => {
    const run = tolerance(microstrip, spreads, 2000, { randomState: 7 });
    expectClose(run.impedance.mean, run.nominal.z0, 0.01, 'mean');
    expect(run.impedance.min).to.be.at.least(run.corners.impedanceLow.value);
    expect(run.impedance.max).to.be.at.most(run.corners.impedanceHigh.value);
    expect(run.impedance.histogram.counts.reduce((sum, n) => sum + n, 0)).to.equal(2000);
  });

  it('gives sensitivities with the physical signs: ∂z0/∂w < 0, ∂z0/∂h > 0, ∂z0/∂er < 0, and the first-order swing', () => {
    const run = tolerance(microstrip, spreads, 10, { randomState: 1 });
    const byField = Object.fromEntries(run.sensitivities.map((entry) => [entry.field, entry]));
    expect(byField['w'].impedancePerUnit).to.be.below(0);
    expect(byField['h'].impedancePerUnit).to.be.above(0);
    expect(byField['er'].impedancePerUnit).to.be.below(0);
    expectClose(byField['w'].impedanceSwing, byField['w'].impedancePerUnit * 25.4e-6, 1e-12, 'swing');
  });

  it('uses zDiff for coupled kinds', () => {
    expect(tolerance(pair, { s: { plusMinus: 10e-6 } }, 50).impedanceQuantity).to.equal('zDiff');
  });

  it('throws LineInputError for bad samples, an unknown input and a doubly given limit', () => {
    expect(() => tolerance(microstrip, spreads, 0)).to.throw(LineInputError).with.property('field', 'samples');
    expect(() => tolerance(microstrip, { q: { plusMinus: 1 } }, 10)).to.throw(LineInputError).with.property('field', 'spreads.q');
    expect(() => tolerance(microstrip, { w: { plusMinus: 1e-6, plusMinusRelative: 0.1 } }, 10)).to.throw(LineInputError).with.property('field', 'spreads.w');
  });
});
