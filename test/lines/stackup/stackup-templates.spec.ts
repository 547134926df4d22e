import { expect } from 'chai';
import {
  COPPER_OUNCE_THICKNESS,
  LineInputError,
  STACKUP_TEMPLATE_LAYER_COUNTS,
  calculate,
  copperIndices,
  lineGeometryFor,
  stackupCrossSection,
  stackupTemplate,
  stackupThickness,
  validateStackup,
  fieldSolveStackupLine,
} from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const um = 1e-6;

describe('stackupTemplate', () => {
  for (const count of STACKUP_TEMPLATE_LAYER_COUNTS) {
    it(`the ${count}-layer template has ${count} copper layers, masks outside, and is near 1.6 mm (common practice, no source)`, () => {
      const stack = stackupTemplate(count);
      validateStackup(stack);
      expect(copperIndices(stack)).to.have.length(count);
      expect(stack.layers[0]).to.include({ type: 'dielectric', kind: 'coating' });
      expect(stack.layers[stack.layers.length - 1]).to.include({ type: 'dielectric', kind: 'coating' });
      expect(stackupThickness(stack) / 1e-3).to.be.within(1.4, 1.8);
      // 1 oz foil taken as 1.37 mil (trade sheets, common practice, no source).
      for (const index of copperIndices(stack)) expect(stack.layers[index].thickness).to.equal(COPPER_OUNCE_THICKNESS);
    });
  }

  it('returns a fresh copy each time and refuses other layer counts', () => {
    const first = stackupTemplate(4);
    first.layers[2].thickness = 1;
    expect(stackupTemplate(4).layers[2].thickness).to.equal(0.2e-3);
    expect(() => stackupTemplate(3)).to.throw(LineInputError).with.property('field', 'layerCount');
  });
});

describe('stackupCrossSection', () => {
  it('lays the top layer of the 4-layer template out as prepreg, conformal mask and strip over the L2 plane', () => {
    const section = stackupCrossSection(stackupTemplate(4), 1, 'single', { width: 300 * um });
    // By hand: prepreg y 0…200 µm (Dk 4.2); strip 200…234.798 µm, x ±150 µm; mask 20 µm over the
    // laminate (200…220 µm) and around the strip (x ±170 µm, up to 254.798 µm), Dk 3.5.
    expect(section.groundPlanes).to.deep.equal({ bottom: 0 });
    const [prepreg, mask, maskOverStrip] = section.dielectrics;
    expect(prepreg).to.deep.include({ relativePermittivity: 4.2 });
    expectClose((prepreg.shape as { top: number }).top, 200 * um, 1e-12, 'prepreg top');
    expect(mask.relativePermittivity).to.equal(3.5);
    expectClose((mask.shape as { top: number }).top, 220 * um, 1e-12, 'mask top');
    expectClose((maskOverStrip.shape as { right: number }).right, 170 * um, 1e-12, 'mask beside the strip');
    expectClose((maskOverStrip.shape as { top: number }).top, 254.798 * um, 1e-12, 'mask over the strip');
    const strip = section.conductors[0].shape as { left: number; right: number; bottom: number; top: number };
    expectClose(strip.right - strip.left, 300 * um, 1e-12, 'strip width');
    expectClose(strip.top - strip.bottom, 34.798 * um, 1e-12, 'strip thickness');
  });

  it('lays an inner layer out band by band between its planes, the etched L4 filled with prepreg', () => {
    const section = stackupCrossSection(stackupTemplate(6), 5, 'single', { width: 300 * um });
    // From L5 upwards: core 300 (4.4), L4 fill 34.798 (prepreg 4.2), prepreg 500 (4.2), strip layer, core 300 (4.4).
    expect(section.dielectrics.map((region) => region.relativePermittivity)).to.deep.equal([4.4, 4.2, 4.2, 4.2, 4.4]);
    expectClose(section.groundPlanes!.top!, (300 + 34.798 + 500 + 34.798 + 300) * um, 1e-12, 'upper plane');
  });

  it('in one uniform dielectric without mask, the field solution matches the Hammerstad–Jensen microstrip within 1 %', async () => {
    const stack = stackupTemplate(4);
    stack.layers = stack.layers.slice(1, -1);
    const dimensions = { width: 350 * um };
    const formula = calculate(lineGeometryFor(stack, 0, 'single', dimensions).spec);
    // Hammerstad–Jensen 1980 claims about 0.2 %; the solver's own estimate is below 0.5 %.
    const solved = await fieldSolveStackupLine(stack, 0, 'single', dimensions);
    expectClose(solved.impedance, formula.z0, 0.01, 'z0');
  });
});
