import { expect } from 'chai';
import {
  COPPER_OUNCE_THICKNESS,
  LineInputError,
  calculate,
  fieldSolveStackupLine,
  lineGeometryFor,
  stackupTemplate,
  type Stackup,
} from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

/** Hand arithmetic is done to 6 figures. */
const HAND = 1e-5;
const EXACT = 1e-12;
const um = 1e-6;
const mm = 1e-3;

/** Layers of the 4-layer template: 0 mask, 1 L1, 2 prepreg 0.2 mm, 3 L2, 4 core 1.0 mm, 5 L3, 6 prepreg 0.2 mm, 7 L4, 8 mask. */
const fourLayer = () => stackupTemplate(4);
/** 6-layer template: 0 mask, 1 L1, 2 pp 0.1, 3 L2 plane, 4 core 0.3, 5 L3, 6 pp 0.5, 7 L4, 8 core 0.3, 9 L5 plane, 10 pp 0.1, 11 L6, 12 mask. */
const sixLayer = () => stackupTemplate(6);

/** Plane / core / signal / prepreg / plane, all one Dk: the textbook centred stripline. */
function symmetricStripline(erAbove = 4, erBelow = 4): Stackup {
  return {
    layers: [
      { type: 'copper', name: 'GND 1', thickness: 35 * um, role: 'plane' },
      { type: 'dielectric', name: 'core', thickness: 0.2 * mm, relativePermittivity: erAbove, lossTangent: 0.01, kind: 'core' },
      { type: 'copper', name: 'SIG', thickness: 17.5 * um, role: 'signal' },
      { type: 'dielectric', name: 'prepreg', thickness: 0.2 * mm, relativePermittivity: erBelow, lossTangent: 0.03, kind: 'prepreg' },
      { type: 'copper', name: 'GND 2', thickness: 35 * um, role: 'plane' },
    ],
  };
}

describe('lineGeometryFor: outer layers', () => {
  it('the top layer under solder mask is an embedded microstrip over the prepreg to L2', () => {
    const geometry = lineGeometryFor(fourLayer(), 1, 'single', { width: 0.35 * mm });
    // By hand from the template: h = prepreg 0.2 mm, Dk 4.2, Df 0.02; cover = mask 20 µm, Dk 3.5;
    // t = 1 oz = 1.37 mil = 1.37 × 25.4 µm = 34.798 µm (trade-sheet figure, common practice, no source).
    expect(geometry.spec).to.deep.include({ kind: 'embedded-microstrip', w: 0.35 * mm, er: 4.2, tanDelta: 0.02, erCover: 3.5 });
    const spec = geometry.spec as { h: number; cover: number; t: number };
    expectClose(spec.h, 200 * um, EXACT, 'h');
    expectClose(spec.cover, 20 * um, EXACT, 'cover');
    expectClose(spec.t, 34.798 * um, EXACT, 't');
    expect(geometry.position).to.equal('outer');
    expect(geometry.referenceIndices).to.deep.equal([3]);
    expect(geometry.isMixedDielectric).to.equal(false);
  });

  it('the bottom layer mirrors the top one, referenced to the plane above it', () => {
    const top = lineGeometryFor(fourLayer(), 1, 'single', { width: 0.35 * mm });
    const bottom = lineGeometryFor(fourLayer(), 7, 'single', { width: 0.35 * mm });
    expect(bottom.spec).to.deep.equal(top.spec);
    expect(bottom.referenceIndices).to.deep.equal([5]);
  });

  it('without a coating the outer layer is a plain microstrip', () => {
    const stack = fourLayer();
    stack.layers = stack.layers.slice(1, -1);
    const geometry = lineGeometryFor(stack, 0, 'single', { width: 0.35 * mm });
    expect(geometry.spec.kind).to.equal('microstrip');
    expect(geometry.warnings).to.deep.equal([]);
  });

  it('a pair on the outer layer is a coupled microstrip and says the mask is left out', () => {
    const geometry = lineGeometryFor(fourLayer(), 1, 'pair', { width: 0.2 * mm, gap: 0.15 * mm });
    expect(geometry.spec).to.deep.include({ kind: 'coupled-microstrip', w: 0.2 * mm, s: 0.15 * mm, er: 4.2 });
    expect(geometry.warnings.join(' ')).to.match(/no cover: the 20 µm over L1 Top is left out/);
  });

  it('a substrate of two dielectrics gets their series (thickness-weighted harmonic) Dk, with a warning', () => {
    const stack = fourLayer();
    // Split the 0.2 mm prepreg into 0.1 mm of Dk 4 over 0.1 mm of Dk 6.
    const prepreg = stack.layers[2] as Extract<Stackup['layers'][number], { type: 'dielectric' }>;
    stack.layers.splice(2, 1, { ...prepreg, thickness: 0.1 * mm, relativePermittivity: 4 }, { ...prepreg, thickness: 0.1 * mm, relativePermittivity: 6 });
    const geometry = lineGeometryFor(stack, 1, 'single', { width: 0.35 * mm });
    // By hand: ε = Σh / Σ(h/ε) = 0.2 / (0.1/4 + 0.1/6) = 0.2 / 0.0416667 = 4.8.
    expectClose(geometry.spec.er, 4.8, HAND, 'er');
    expect(geometry.isMixedDielectric).to.equal(true);
    expect(geometry.warnings.join(' ')).to.match(/Dk 4, 6 .* thickness-weighted Dk of 4\.8/);
  });
});

describe('lineGeometryFor: inner layers', () => {
  it('a layer centred between two planes in one Dk is a stripline with b = h above + t + h below', () => {
    const geometry = lineGeometryFor(symmetricStripline(), 2, 'single', { width: 0.15 * mm });
    // By hand: b = 200 + 17.5 + 200 = 417.5 µm; Df = (0.01 + 0.03)/2 = 0.02 for equal sides of equal Dk
    // (each side's energy share ∝ ε/h is one half).
    expect(geometry.spec.kind).to.equal('stripline');
    expectClose((geometry.spec as { b: number }).b, 417.5 * um, EXACT, 'b');
    expectClose(geometry.spec.er, 4, EXACT, 'er');
    expectClose(geometry.spec.tanDelta!, 0.02, HAND, 'tanDelta');
    expect(geometry.position).to.equal('inner');
    expect(geometry.referenceIndices).to.deep.equal([0, 4]);
    expect(geometry.warnings).to.deep.equal([]);
  });

  it('L3 of the 6-layer template is an offset stripline between L2 and L5 across the etched L4', () => {
    const geometry = lineGeometryFor(sixLayer(), 5, 'single', { width: 0.36 * mm });
    // By hand. Above: core 300 µm, Dk 4.4. Below: prepreg 500 µm (4.2), L4's copper 34.798 µm filled
    // with that prepreg (4.2), core 300 µm (4.4): h below = 834.798 µm,
    // ε below = 834.798 / (534.798/4.2 + 300/4.4) = 834.798 / (127.3329 + 68.1818) = 4.269746.
    // The two sides in parallel: ε = (4.4/300 + 4.269746/834.798) / (1/300 + 1/834.798)
    //   = (0.0146667 + 0.00511470) / (0.00333333 + 0.00119790) = 4.365565.
    expect(geometry.spec.kind).to.equal('offset-stripline');
    const spec = geometry.spec as { h1: number; h2: number; t: number; er: number };
    expectClose(spec.h1, 834.798 * um, HAND, 'h1 (to the plane below)');
    expectClose(spec.h2, 300 * um, EXACT, 'h2 (to the plane above)');
    expectClose(spec.t, COPPER_OUNCE_THICKNESS, EXACT, 't');
    expectClose(spec.er, 4.365565, HAND, 'er');
    expect(geometry.referenceIndices).to.deep.equal([3, 9]);
    expect(geometry.warnings.join(' ')).to.match(/L4 lies between L3 and its reference L5 GND/);
  });

  it('an off-centre pair is computed as a centred coupled stripline, with a warning', () => {
    const geometry = lineGeometryFor(sixLayer(), 5, 'pair', { width: 0.15 * mm, gap: 0.15 * mm });
    expect(geometry.spec.kind).to.equal('coupled-stripline');
    expectClose((geometry.spec as { b: number }).b, (300 + 34.798 + 834.798) * um, HAND, 'b');
    expect(geometry.warnings.join(' ')).to.match(/sits off-centre/);
  });

  it('for a wide strip the blended Dk agrees with the layered field solution (the blend is exact for plane capacitors)', async () => {
    // Dk 3 above, 5 below: ε = (3/0.2 + 5/0.2)/(2/0.2) = 4 by hand. A strip 10× wider than the
    // spacing has mostly the parallel-plate field, so the formula and the solver should agree closely.
    const stack = symmetricStripline(3, 5);
    const dimensions = { width: 2 * mm };
    const geometry = lineGeometryFor(stack, 2, 'single', dimensions);
    expectClose(geometry.spec.er, 4, HAND, 'er');
    const solved = await fieldSolveStackupLine(stack, 2, 'single', dimensions);
    expectClose(calculate(geometry.spec).z0, solved.impedance, 0.01, 'z0 formula vs layered field solution');
  });
});

describe('lineGeometryFor: impossible placements', () => {
  const throwsOn = (action: () => unknown, field: string) => {
    expect(action).to.throw(LineInputError).with.property('field', field);
  };

  it('refuses a plane, a dielectric and a layer with no reference', () => {
    throwsOn(() => lineGeometryFor(fourLayer(), 3, 'single', { width: 0.1 * mm }), 'layerIndex');
    throwsOn(() => lineGeometryFor(fourLayer(), 2, 'single', { width: 0.1 * mm }), 'layerIndex');
    throwsOn(() => lineGeometryFor(stackupTemplate(2), 3, 'single', { width: 0.1 * mm }), 'layerIndex');
  });

  it('names a missing gap, a bad width and a bad layer field', () => {
    throwsOn(() => lineGeometryFor(fourLayer(), 1, 'pair', { width: 0.1 * mm }), 'gap');
    throwsOn(() => lineGeometryFor(fourLayer(), 1, 'single', { width: -1 }), 'width');
    const stack = fourLayer();
    (stack.layers[4] as { relativePermittivity: number }).relativePermittivity = 0.5;
    throwsOn(() => lineGeometryFor(stack, 1, 'single', { width: 0.1 * mm }), 'layers[4].relativePermittivity');
  });

  it('refuses touching copper layers and a coating inside the board', () => {
    const touching = fourLayer();
    touching.layers.splice(2, 1);
    throwsOn(() => lineGeometryFor(touching, 1, 'single', { width: 0.1 * mm }), 'layers[2]');
    const inside = fourLayer();
    (inside.layers[4] as { kind: string }).kind = 'coating';
    throwsOn(() => lineGeometryFor(inside, 1, 'single', { width: 0.1 * mm }), 'layers[4].kind');
  });
});
