import { expect } from 'chai';
import { LineInputError, ladderError, ladderStepResponse, stepResponse, type StepCircuit } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const circuit: StepCircuit = {
  source: { amplitude: 1, resistance: 25, riseTime: 200e-12 },
  line: { z0: 50, delay: 1e-9 },
  load: { resistance: 100 },
};

describe('transient ladder (N-section lumped Π model)', () => {
  it('its error against the exact lattice solution shrinks as N grows, to below 1 % at 200 sections (the distributed line is the N → ∞ limit)', () => {
    const rows = ladderError(circuit, [5, 20, 50, 200]);
    for (let i = 1; i < rows.length; i++) expect(rows[i].maxError).to.be.below(rows[i - 1].maxError);
    expect(rows[0].maxError).to.be.above(0.1);
    expect(rows.at(-1)!.maxError).to.be.below(0.01);
    expect(rows.at(-1)!.rmsError).to.be.below(rows.at(-1)!.maxError);
  });

  it('once the sections are short against the edge, the error falls as 1/N² (second-order lumping error of a symmetric section)', () => {
    const slow = { ...circuit, source: { ...circuit.source, riseTime: 500e-12 } };
    const [a, b] = ladderError(slow, [100, 400], { duration: 20e-9 });
    expect(a.maxError / b.maxError).to.be.within(16 * 0.8, 16 * 1.25);
  });

  it('with a single section is the Π network Vs → Rs → C/2 ∥ (L → C/2 ∥ RL): the DC level is still Vs·RL/(Rs + RL)', () => {
    const r = ladderStepResponse(circuit, 1, { duration: 200e-9 });
    expectClose(r.load.voltage.at(-1)!, 100 / 125, 1e-6);
  });

  it('needs a finite rise time (it is solved in the frequency domain)', () => {
    expect(() => ladderStepResponse({ ...circuit, source: { ...circuit.source, riseTime: 0 } }, 10))
      .to.throw(LineInputError)
      .with.property('field', 'source.riseTime');
  });

  it('ends at the same DC level as the line, Vs·RL/(Rs + RL) (Ohm’s law)', () => {
    const r = ladderStepResponse(circuit, 40, { duration: 60e-9 });
    expect(r.method).to.equal('ladder');
    expectClose(r.load.final, 100 / 125, 1e-12);
    expectClose(r.load.voltage.at(-1)!, 100 / 125, 1e-4);
    expectClose(r.load.current.at(-1)!, 1 / 125, 1e-4);
  });

  it('handles a zero-resistance source, a shorted load and a series R–C load, converging on the distributed answer', () => {
    const cases: StepCircuit['load'][] = ['short', { seriesRc: { resistance: 50, capacitance: 50e-12 } }];
    for (const load of cases) {
      const [coarse, fine] = ladderError({ ...circuit, load }, [10, 100]);
      expect(fine.maxError).to.be.at.most(coarse.maxError);
      expect(fine.maxError).to.be.below(0.02);
    }
    const [coarse, fine] = ladderError({ ...circuit, source: { ...circuit.source, resistance: 0 } }, [10, 100]);
    expect(fine.maxError).to.be.below(coarse.maxError);
  });

  it('its source current matches the lattice’s to 1 % of the DC current with 200 sections', () => {
    const reference = stepResponse(circuit);
    const ladder = ladderStepResponse(circuit, 200, { duration: reference.time.at(-1) });
    const worst = ladder.source.current.reduce((m, v, i) => Math.max(m, Math.abs(v - reference.source.current[i])), 0);
    expect(worst / reference.source.finalCurrent).to.be.below(0.01);
  });

  it('refuses a section count that is not a whole number from 1 to 10 000', () => {
    for (const sections of [0, 2.5, 20_000]) {
      expect(() => ladderStepResponse(circuit, sections)).to.throw(LineInputError).with.property('field', 'sections');
    }
  });
});
