import { crossSectionFromSpec, type LineSpec } from '@linewright/lines';
import { sectionLayout } from './section-layout';

function layoutOf(spec: LineSpec) {
  return sectionLayout(crossSectionFromSpec(spec), spec);
}

describe('sectionLayout', () => {
  it('marks a microstrip with w across the strip, h from the plane to the strip and t beside it', () => {
    const spec: LineSpec = { kind: 'microstrip', w: 0.3e-3, h: 0.17e-3, t: 35e-6, er: 4.3 };
    const marks = Object.fromEntries(layoutOf(spec).dimensions.map((mark) => [mark.field, mark]));
    expect(Object.keys(marks).sort()).toEqual(['h', 't', 'w']);
    expect(marks['w'].to[0] - marks['w'].from[0]).toBeCloseTo(0.3e-3, 12);
    expect(marks['h'].to[1] - marks['h'].from[1]).toBeCloseTo(0.17e-3, 12);
    expect(marks['t'].to[1] - marks['t'].from[1]).toBeCloseTo(35e-6, 12);
  });

  it('draws a coax as a shield around the dielectric around the inner conductor, marked d and D', () => {
    const layout = layoutOf({ kind: 'coax', d: 1e-3, D: 3.3e-3, er: 2.25 });
    expect(layout.dimensions.map((mark) => mark.field).sort()).toEqual(['D', 'd']);
    expect(layout.primitives.map((shape) => shape.paint)).toEqual(['plane', 'dielectric', 'signal']);
  });

  it('marks the gap s between the two strips of a pair', () => {
    const layout = layoutOf({ kind: 'coupled-stripline', w: 0.12e-3, s: 0.2e-3, b: 0.5e-3, t: 17e-6, er: 4.3 });
    const gap = layout.dimensions.find((mark) => mark.field === 's');
    expect(gap && gap.to[0] - gap.from[0]).toBeCloseTo(0.2e-3, 12);
  });

  it('keeps every drawn polygon inside the view', () => {
    const layout = layoutOf({ kind: 'cpw', w: 0.3e-3, g: 0.15e-3, h: 0.5e-3, t: 35e-6, er: 4.3, grounded: true });
    for (const shape of layout.primitives) {
      if (shape.type !== 'polygon') continue;
      for (const [x] of shape.points) expect(Number.isFinite(x)).toBe(true);
    }
  });
});
