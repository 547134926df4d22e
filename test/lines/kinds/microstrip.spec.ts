import { expect } from 'chai';
import { calculate, FREE_SPACE_IMPEDANCE, LineInputError, type MicrostripSpec } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

/** Pozar's design formulas are themselves approximations, so agreement within 1 % is what the example can show. */
const HANDBOOK_TOLERANCE = 0.01;
const EXACT = 1e-12;

const board: MicrostripSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 34.8e-6, er: 4.3 };

describe('microstrip (Hammerstad–Jensen 1980)', () => {
  it('matches the 50 Ω design of Pozar, Microwave Engineering, 3rd ed., Example 3.7 (εr = 2.20, W/d = 3.081, εe = 1.87)', () => {
    // Example values recalled from memory, not checked against the text.
    const h = 1.27e-3;
    const result = calculate({ kind: 'microstrip', w: 3.081 * h, h, t: 0, er: 2.2 });
    expectClose(result.z0, 50, HANDBOOK_TOLERANCE, 'z0');
    expectClose(result.erEff, 1.87, HANDBOOK_TOLERANCE, 'erEff');
  });

  it('in air has εeff = 1 exactly, for any thickness', () => {
    for (const t of [0, 17e-6, 70e-6]) {
      expectClose(calculate({ ...board, t, er: 1 }).erEff, 1, EXACT, `erEff t=${t}`);
    }
  });

  it('for a very wide strip tends to the parallel-plate impedance η0·h/(w·√εeff) (exact limit; fringing adds a little width)', () => {
    const result = calculate({ ...board, w: 1000 * board.h, t: 0 });
    const parallelPlate = (FREE_SPACE_IMPEDANCE * board.h) / (1000 * board.h * Math.sqrt(result.erEff));
    // Fringing widens the strip by a few h (of order (2h/π)·ln(w/h)), i.e. well under 1 % at w/h = 1000.
    expectClose(result.z0, parallelPlate, 0.01, 'z0');
    expect(result.z0).to.be.below(parallelPlate);
  });

  it('z0 falls as w grows and rises as h grows', () => {
    const z = (w: number, h: number) => calculate({ ...board, w, h }).z0;
    expect(z(0.4e-3, 0.17e-3)).to.be.below(z(0.3e-3, 0.17e-3));
    expect(z(0.3e-3, 0.2e-3)).to.be.above(z(0.3e-3, 0.17e-3));
  });

  it('a thicker strip lowers z0 (thickness correction widens the strip)', () => {
    expect(calculate({ ...board, t: 70e-6 }).z0).to.be.below(calculate({ ...board, t: 0 }).z0);
  });

  it('keeps L·C = εeff/c0² and √(L/C) = z0 (TEM identities)', () => {
    const result = calculate(board);
    expectClose(Math.sqrt(result.lPerMeter / result.cPerMeter), result.z0, EXACT, 'sqrt(L/C)');
    expectClose(result.lPerMeter * result.cPerMeter * 299_792_458 ** 2, result.erEff, EXACT, 'LC c0²');
  });

  it('the IPC-2141 method stays within 5 % of Hammerstad–Jensen inside its range and strays far outside it (IPC-2141A claims only a narrow range)', () => {
    const inside = { ...board, w: board.h, t: 17e-6 };
    expectClose(calculate({ ...inside, method: 'ipc-2141' }).z0, calculate(inside).z0, 0.05, 'inside');
    const wide = { ...board, w: 5 * board.h, t: 17e-6 };
    const error = Math.abs(calculate({ ...wide, method: 'ipc-2141' }).z0 / calculate(wide).z0 - 1);
    expect(error).to.be.above(0.1);
    expect(calculate({ ...wide, method: 'ipc-2141' }).warnings.join(' ')).to.contain('IPC-2141A');
  });

  it('warns when w/h is outside 0.01–100, the published range', () => {
    const result = calculate({ ...board, w: 0.001 * board.h });
    expect(result.warnings.join(' ')).to.contain('w/h').and.to.contain('0.01–100');
  });

  it('throws LineInputError naming the field for zero width, negative thickness, er < 1, NaN and Infinity', () => {
    const cases: [Partial<MicrostripSpec>, string][] = [
      [{ w: 0 }, 'w'],
      [{ h: -1e-3 }, 'h'],
      [{ t: -1e-6 }, 't'],
      [{ er: 0.9 }, 'er'],
      [{ w: Number.NaN }, 'w'],
      [{ h: Number.POSITIVE_INFINITY }, 'h'],
    ];
    for (const [change, field] of cases) {
      expect(() => calculate({ ...board, ...change }), field).to.throw(LineInputError).with.property('field', field);
    }
  });
});
