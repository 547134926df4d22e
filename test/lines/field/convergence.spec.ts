import { expect } from 'chai';
import { fieldSolveLine, type LineSpec } from '../../../projects/lines/src/public-api';
import { coaxExact, cohnCoupledStripline, cohnStripline } from './exact-references';

/** Field solves take up to a few seconds each; mocha's 2 s default is for unit tests. */
const SOLVE_TIMEOUT = 30_000;

const mm = 1e-3;

describe('field solver convergence control', function () {
  this.timeout(SOLVE_TIMEOUT);
  it('the change in Z0 between successive grids shrinks as the grid is refined (self-convergence)', async () => {
    const result = await fieldSolveLine({ kind: 'microstrip', w: 0.3 * mm, h: 0.17 * mm, t: 35e-6, er: 4.2 }, { tolerance: 0.001 });
    const levels = result.solution.levels;
    expect(levels.length).to.be.at.least(4);
    const changes = levels.slice(1).map((level, i) => Math.abs(level.z0 - levels[i]!.z0));
    for (let i = 1; i < changes.length; i++) expect(changes[i], `change ${i}`).to.be.below(changes[i - 1]!);
    for (let i = 1; i < levels.length; i++) expect(levels[i]!.cells).to.be.above(levels[i - 1]!.cells);
  });

  it('a tighter tolerance gives a smaller estimated error on a finer grid, and stays within the looser estimate', async () => {
    const spec: LineSpec = { kind: 'coupled-microstrip', w: 0.15 * mm, s: 0.2 * mm, h: 0.1 * mm, t: 35e-6, er: 4.2 };
    const loose = await fieldSolveLine(spec, { tolerance: 0.01 });
    const tight = await fieldSolveLine(spec, { tolerance: 0.001 });
    expect(tight.estimatedError).to.be.below(0.001);
    expect(tight.estimatedError).to.be.below(loose.estimatedError);
    expect(tight.cells).to.be.above(loose.cells);
    expect(Math.abs(loose.zOdd! - tight.zOdd!) / tight.zOdd!).to.be.at.most(loose.estimatedError + tight.estimatedError);
    expect(Math.abs(loose.zEven! - tight.zEven!) / tight.zEven!).to.be.at.most(loose.estimatedError + tight.estimatedError);
  });

  it('the estimated error is an upper bound of the actual error against exact results (Cohn 1954, 1955; coax)', async () => {
    const b = 0.5 * mm;
    const cases: [LineSpec, (r: Awaited<ReturnType<typeof fieldSolveLine>>) => number][] = [
      [{ kind: 'stripline', w: 0.3 * b, b, t: 0, er: 4 }, (r) => Math.abs(r.z0 / cohnStripline(0.3 * b, b, 4) - 1)],
      [
        { kind: 'coupled-stripline', w: 0.4 * b, s: 0.3 * b, b, t: 0, er: 4 },
        (r) => {
          const exact = cohnCoupledStripline(0.4 * b, 0.3 * b, b, 4);
          return Math.max(Math.abs(r.zOdd! / exact.zOdd - 1), Math.abs(r.zEven! / exact.zEven - 1));
        },
      ],
      [{ kind: 'coax', d: 0.5 * mm, D: 1.75 * mm, er: 1 }, (r) => Math.abs(r.z0 / coaxExact(0.5 * mm, 1.75 * mm, 1) - 1)],
    ];
    for (const [spec, actualError] of cases) {
      for (const tolerance of [0.01, 0.002]) {
        const result = await fieldSolveLine(spec, { tolerance });
        expect(actualError(result), `${spec.kind} at tolerance ${tolerance}`).to.be.at.most(result.estimatedError);
        expect(result.estimatedError, `${spec.kind} at tolerance ${tolerance}`).to.be.at.most(tolerance);
      }
    }
  });
});
