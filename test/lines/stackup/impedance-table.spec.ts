import { expect } from 'chai';
import {
  COMMON_FABRICATION_SPREADS,
  COMMON_IMPEDANCE_TOLERANCE,
  ESTIMATE_NOTE,
  LineInputError,
  calculate,
  impedanceTable,
  lineGeometryFor,
  solveLineDimension,
  stackupTemplate,
  tolerance,
  type LinePlacement,
} from '../../../projects/lines/src/public-api';
import { expectClose } from '../expect-close';

const SOLVED = 1e-7;
const mm = 1e-3;

const fourLayer = () => stackupTemplate(4);

describe('solveLineDimension', () => {
  it('solves the width of a 50 Ω line on the top layer; calculate() of the solved spec gives 50 Ω', () => {
    const solved = solveLineDimension(fourLayer(), 1, 'single', 50, {});
    expectClose(calculate(solved.geometry.spec).z0, 50, SOLVED, 'z0');
    expect(solved.dimensions.width).to.equal(solved.value);
    // A 50 Ω FR-4 microstrip is roughly twice as wide as its dielectric is high (common practice, no source).
    expect(solved.value / 0.2e-3).to.be.within(1.4, 2.2);
  });

  it('solves the width of a 100 Ω pair for a given gap, and the gap for a given width', () => {
    const width = solveLineDimension(fourLayer(), 1, 'pair', 100, { gap: 0.15 * mm });
    expectClose(calculate(width.geometry.spec).zDiff!, 100, SOLVED, 'zDiff');
    expect(width.dimensions.gap).to.equal(0.15 * mm);
    const gap = solveLineDimension(fourLayer(), 1, 'pair', 100, { width: width.value }, 'gap');
    expectClose(gap.value, 0.15 * mm, 1e-6, 'gap recovers the gap the width was solved for');
  });

  it('solves inner layers (offset stripline) as well', () => {
    const solved = solveLineDimension(stackupTemplate(6), 5, 'single', 50, {});
    expect(solved.geometry.spec.kind).to.equal('offset-stripline');
    expectClose(calculate(solved.geometry.spec).z0, 50, SOLVED, 'z0');
  });

  it('names the unknown when the target cannot be reached, and the impedance when it is not positive', () => {
    expect(() => solveLineDimension(fourLayer(), 1, 'single', 2000, {})).to.throw(LineInputError).with.property('field', 'w');
    expect(() => solveLineDimension(fourLayer(), 1, 'single', -5, {})).to.throw(LineInputError).with.property('field', 'impedance');
  });
});

describe('impedanceTable', () => {
  const placements: LinePlacement[] = [
    { label: 'Outer 50 Ω', layerIndex: 1, structure: 'single', targetImpedance: 50, tolerance: COMMON_IMPEDANCE_TOLERANCE, width: 0.35 * mm },
    { label: 'Outer 100 Ω pair', layerIndex: 7, structure: 'pair', targetImpedance: 100, tolerance: 0.1, width: 0.2 * mm, gap: 0.2 * mm },
  ];

  it('every row’s impedance and delay equal calculate() of the derived spec', () => {
    const stack = fourLayer();
    const table = impedanceTable(stack, placements);
    placements.forEach((placement, index) => {
      const row = table.rows[index];
      const result = calculate(lineGeometryFor(stack, placement.layerIndex, placement.structure, placement).spec);
      expect(row.impedance).to.equal(placement.structure === 'pair' ? result.zDiff : result.z0);
      expect(row.delayPerMeter).to.equal(result.delayPerMeter);
      expect(row.erEff).to.equal(result.erEff);
    });
  });

  it('carries layer names, references, the deviation from target and the tolerance verdict', () => {
    const [single, pair] = impedanceTable(fourLayer(), placements).rows;
    expect(single).to.include({ layerName: 'L1 Top', structure: 'single', kind: 'embedded-microstrip', gap: null });
    expect(single.referenceLayers).to.deep.equal(['L2 GND']);
    expect(pair).to.include({ layerName: 'L4 Bottom', kind: 'coupled-microstrip', gap: 0.2 * mm });
    expect(pair.referenceLayers).to.deep.equal(['L3 GND']);
    for (const row of [single, pair]) {
      expectClose(row.deviation, (row.impedance - row.targetImpedance) / row.targetImpedance, 1e-12, 'deviation');
      expect(row.isWithinTolerance).to.equal(Math.abs(row.deviation) <= row.tolerance);
    }
  });

  it('the spread brackets the nominal value and equals tolerance()’s worst corners for the same limits', () => {
    const stack = fourLayer();
    const [row] = impedanceTable(stack, placements.slice(0, 1)).rows;
    expect(row.spreadLow).to.be.below(row.impedance);
    expect(row.spreadHigh).to.be.above(row.impedance);
    const spread = { plusMinusRelative: 0.1 };
    const direct = tolerance(row.spec, { w: spread, er: { plusMinusRelative: 0.05 }, h: spread, cover: spread }, 64);
    expect(row.spreadLow).to.equal(direct.corners.impedanceLow.value);
    expect(row.spreadHigh).to.equal(direct.corners.impedanceHigh.value);
    // Wider width lowers the impedance; thicker dielectric raises it.
    expect(row.sensitivities.find((entry) => entry.field === 'w')!.impedanceSwing).to.be.below(0);
    expect(row.sensitivities.find((entry) => entry.field === 'h')!.impedanceSwing).to.be.above(0);
  });

  it('uses ±10 % width and thickness and ±5 % Dk unless told otherwise, and carries the estimate note', () => {
    const table = impedanceTable(fourLayer(), placements);
    expect(table.spreads).to.deep.equal(COMMON_FABRICATION_SPREADS);
    expect(table.note).to.equal(ESTIMATE_NOTE);
    const none = impedanceTable(fourLayer(), placements, { spreads: { width: 0, dielectricThickness: 0, relativePermittivity: 0 } });
    expect(none.rows[0].spreadLow).to.equal(none.rows[0].impedance);
  });

  it('names the placement field that is wrong', () => {
    const bad = [{ ...placements[0], tolerance: 1.5 }];
    expect(() => impedanceTable(fourLayer(), bad)).to.throw(LineInputError).with.property('field', 'placements[0].tolerance');
    expect(() => impedanceTable(fourLayer(), placements, { spreads: { ...COMMON_FABRICATION_SPREADS, width: -1 } }))
      .to.throw(LineInputError)
      .with.property('field', 'spreads.width');
  });
});
