import { expect } from 'chai';
import { type CrossSection, crossSectionFromSpec, fieldSolve, type LineSpec } from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

/** Field solves take up to a few seconds each; mocha's 2 s default is for unit tests. */
const SOLVE_TIMEOUT = 30_000;
const mm = 1e-3;
/** μ0·ε0 (CODATA 2018): for TEM lines L·C0 = μ0ε0·I. */
const MU0_EPS0 = 1.25663706212e-6 * 8.8541878128e-12;

const pair: LineSpec = { kind: 'coupled-microstrip', w: 0.15 * mm, s: 0.2 * mm, h: 0.1 * mm, t: 35e-6, er: 4.2 };

describe('field solver symmetry, matrices and potential map', function () {
  this.timeout(SOLVE_TIMEOUT);

  it('solves a single strip on a mirrored half and a symmetric pair by odd and even modes', async () => {
    expect((await fieldSolve(crossSectionFromSpec({ kind: 'microstrip', w: 0.3 * mm, h: 0.17 * mm, t: 35e-6, er: 4.2 }))).symmetry).to.equal('mirror');
    expect((await fieldSolve(crossSectionFromSpec(pair))).symmetry).to.equal('pair');
  });

  it('the odd/even half-domain solution agrees with the whole-domain capacitance matrix within the estimated errors', async () => {
    const section = crossSectionFromSpec(pair);
    const halves = await fieldSolve(section, { tolerance: 0.002 });
    const whole = await fieldSolve(section, { tolerance: 0.002, useSymmetry: false });
    expect(whole.symmetry).to.equal('none');
    const allowed = halves.estimatedError + whole.estimatedError;
    expectClose(halves.zOdd!, whole.zOdd!, allowed, 'zOdd');
    expectClose(halves.zEven!, whole.zEven!, allowed, 'zEven');
  });

  it('an unequal pair is solved on the whole domain, and its matrices are symmetric with L·C0 = μ0ε0·I', async () => {
    const section = crossSectionFromSpec(pair);
    const shape = section.conductors[1]!.shape;
    if (shape.shape !== 'trapezoid') throw new Error('expected trapezoid strips');
    const unequal: CrossSection = { ...section, conductors: [section.conductors[0]!, { ...section.conductors[1]!, shape: { ...shape, bottomWidth: 0.25 * mm, topWidth: 0.25 * mm } }] };
    const result = await fieldSolve(unequal);
    expect(result.symmetry).to.equal('none');
    expect(result.warnings.join(' ')).to.contain('not alike');
    for (const matrix of [result.capacitance, result.vacuumCapacitance, result.inductance]) expectClose(matrix[0]![1]!, matrix[1]![0]!, 1e-6, 'symmetry');
    expect(result.capacitance[0]![1]!).to.be.below(0);
    const identity = [0, 1].map((i) => [0, 1].map((j) => result.inductance[i]![0]! * result.vacuumCapacitance[0]![j]! + result.inductance[i]![1]! * result.vacuumCapacitance[1]![j]!));
    expectClose(identity[0]![0]!, MU0_EPS0, 1e-9, 'LC0 11');
    expectClose(identity[1]![1]!, MU0_EPS0, 1e-9, 'LC0 22');
    expect(Math.abs(identity[0]![1]!)).to.be.below(1e-9 * MU0_EPS0);
  });

  it('the potential map of a single strip lies between 0 and 1 V (maximum principle), is 1 V on the strip and mirror-symmetric', async () => {
    const spec: LineSpec = { kind: 'microstrip', w: 0.3 * mm, h: 0.17 * mm, t: 35e-6, er: 4.2 };
    const { potential } = await fieldSolve(crossSectionFromSpec(spec));
    const { x, y, values } = potential;
    expect(values.length).to.equal(x.length * y.length);
    for (const value of values) expect(value).to.be.within(-1e-9, 1 + 1e-9);
    const at = (px: number, py: number): number => {
      const i = x.findIndex((value) => value >= px);
      const j = y.findIndex((value) => value >= py);
      return values[j * x.length + i]!;
    };
    expectClose(at(0, spec.h + spec.t / 2), 1, 1e-9, 'on the strip');
    for (let j = 0; j < y.length; j += 7) for (let i = 0; i < x.length; i += 5) expectClose(values[j * x.length + i]!, values[j * x.length + x.length - 1 - i]!, 1e-9, 'mirror');
  });

  it('the potential map of a pair shows the odd mode: antisymmetric, between −1 and 1 V', async () => {
    const { potential } = await fieldSolve(crossSectionFromSpec(pair));
    const { x, y, values } = potential;
    expect(potential.excitation).to.contain('odd');
    for (const value of values) expect(value).to.be.within(-1 - 1e-9, 1 + 1e-9);
    for (let j = 0; j < y.length; j += 7) for (let i = 0; i < x.length; i += 5) expectClose(values[j * x.length + i]!, -values[j * x.length + x.length - 1 - i]!, 1e-9, 'antisymmetry');
  });
});
