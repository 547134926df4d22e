import { expect } from 'chai';
import {
  type CrossSection,
  crossSectionFromSpec,
  FieldSolveCancelledError,
  fieldSolve,
  LineInputError,
  type MicrostripSpec,
} from '../../../projects/lines/src/public-api';

/** Field solves take up to a few seconds each; mocha's 2 s default is for unit tests. */
const SOLVE_TIMEOUT = 30_000;

const microstrip: MicrostripSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 35e-6, er: 4.2 };
const section = crossSectionFromSpec(microstrip);

async function rejection(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    // The rejection is the value under test.
    return error;
  }
  throw new Error('expected the promise to reject');
}

describe('fieldSolve options: progress, cancellation, caps and input checks', function () {
  this.timeout(SOLVE_TIMEOUT);

  it('reports progress once per grid with a fraction in [0, 1], ending on the result grid', async () => {
    const reports: { fraction: number; cells: number; level: number }[] = [];
    const result = await fieldSolve(section, { tolerance: 0.001, onProgress: (fraction, info) => reports.push({ fraction, cells: info.cells, level: info.level }) });
    expect(reports.length).to.equal(result.levels.length);
    reports.forEach((report, index) => {
      expect(report.level).to.equal(index);
      expect(report.fraction).to.be.within(0, 1);
    });
    expect(reports[reports.length - 1]!.cells).to.equal(result.cells);
  });

  it('stops with FieldSolveCancelledError when isCancelled turns true, or when the signal is aborted', async () => {
    let polls = 0;
    expect(await rejection(fieldSolve(section, { isCancelled: () => ++polls > 3 }))).to.be.instanceOf(FieldSolveCancelledError);
    expect(await rejection(fieldSolve(section, { signal: { aborted: true } }))).to.be.instanceOf(FieldSolveCancelledError);
  });

  it('under a cell cap returns the best result so far, its estimated error and a warning', async () => {
    const result = await fieldSolve(section, { tolerance: 1e-5, maxCells: 20_000 });
    expect(result.cells).to.be.at.most(20_000);
    expect(result.estimatedError).to.be.above(1e-5).and.below(0.05);
    expect(result.warnings.join(' ')).to.contain('cap 20000');
  });

  it('under a time cap returns after at least two grids with a finite error estimate and a warning', async () => {
    const result = await fieldSolve(section, { tolerance: 1e-5, maxMillis: 1 });
    expect(result.levels.length).to.be.at.least(2);
    expect(Number.isFinite(result.estimatedError)).to.equal(true);
    expect(result.warnings.join(' ')).to.contain('cap 1 ms');
  });

  it('rejects impossible sections with LineInputError naming the field', async () => {
    const noSignal: CrossSection = { ...section, conductors: [{ role: 'ground', shape: { shape: 'circle', centerX: 0, centerY: 1e-3, radius: 1e-4 } }] };
    const badRadius: CrossSection = { ...section, conductors: [{ role: 'signal', shape: { shape: 'circle', centerX: 0, centerY: 1e-3, radius: -1 } }] };
    const badPermittivity: CrossSection = { ...section, dielectrics: [{ relativePermittivity: 0.5, shape: section.dielectrics[0]!.shape }] };
    const buried: CrossSection = {
      ...section,
      conductors: [...section.conductors, { role: 'signal', shape: { shape: 'rectangle', left: -1e-4, right: 1e-4, bottom: -2e-4, top: -1e-4 } }],
    };
    const upsideDown: CrossSection = { ...section, groundPlanes: { bottom: 1e-3, top: 0 } };
    expect(await rejection(fieldSolve(noSignal))).to.be.instanceOf(LineInputError).with.property('field', 'conductors');
    expect(await rejection(fieldSolve(badRadius))).to.be.instanceOf(LineInputError).with.property('field', 'conductors[0].shape.radius');
    expect(await rejection(fieldSolve(badPermittivity))).to.be.instanceOf(LineInputError).with.property('field', 'dielectrics[0].relativePermittivity');
    expect(await rejection(fieldSolve(buried))).to.be.instanceOf(LineInputError).with.property('field', 'conductors[1]');
    expect(await rejection(fieldSolve(upsideDown))).to.be.instanceOf(LineInputError).with.property('field', 'groundPlanes.top');
  });
});
