import { expect } from 'chai';
import { type CrossSection, crossSectionFromSpec, fieldSolve, type MicrostripSpec } from '../../../projects/lines/src/public-api';
import { OPEN_BOUNDARY_DISTANCE } from '../../../projects/lines/src/field/domain';
import { expectClose } from '../expect-close';

/** Field solves take up to a few seconds each; mocha's 2 s default is for unit tests. */
const SOLVE_TIMEOUT = 30_000;

/** The truncation the open-boundary choice in domain.ts claims at 60 section sizes. */
const TRUNCATION_CLAIM = 2e-4;

const spec: MicrostripSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 35e-6, er: 4.2 };
const size = Math.max(spec.w, spec.h + spec.t);

/** The microstrip closed by a grounded box `distance` section sizes from the strip. */
function boxed(distance: number): CrossSection {
  const reach = distance * size;
  return {
    ...crossSectionFromSpec(spec),
    enclosure: { shape: 'rectangle', left: -spec.w / 2 - reach, right: spec.w / 2 + reach, bottom: 0, top: spec.h + spec.t + reach },
  };
}

describe('open-boundary truncation of the field solver', function () {
  this.timeout(SOLVE_TIMEOUT);
  it(`closes open sections with a grounded box ${OPEN_BOUNDARY_DISTANCE} section sizes away`, async () => {
    const open = await fieldSolve(crossSectionFromSpec(spec), { tolerance: 0.002 });
    const box = await fieldSolve(boxed(OPEN_BOUNDARY_DISTANCE), { tolerance: 0.002 });
    expectClose(open.z0, box.z0, 1e-12, 'z0');
  });

  it('moving the walls from 60 to 240 section sizes changes Z0 and εeff of a microstrip by less than 0.02 %', async () => {
    // The grounded walls add capacitance, so Z0 rises towards the open value as they recede.
    const near = await fieldSolve(boxed(60), { tolerance: 0.002 });
    const far = await fieldSolve(boxed(240), { tolerance: 0.002 });
    expectClose(near.z0, far.z0, TRUNCATION_CLAIM, 'z0');
    expectClose(near.erEff, far.erEff, TRUNCATION_CLAIM, 'erEff');
    const closer = await fieldSolve(boxed(15), { tolerance: 0.002 });
    expect(closer.z0).to.be.below(near.z0);
  });
});
