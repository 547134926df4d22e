/**
 * Edge-coupled stripline: two strips of width w, edge gap s, centred between
 * planes b apart, in one homogeneous dielectric.
 */
import type { CoupledStriplineSpec } from '../types';
import { checkRange, requirePositive, type ValidityRange } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import type { LineModel } from './line-model';
import { validateStriplineGeometry } from './stripline';
import { COHN_1955, cohnCoupledStripline, cohnFringingCapacitance, cohnStripline, stripline, WHEELER_1978 } from './stripline-formulas';

const METHOD = {
  name: `${COHN_1955.name}, with Cohn's fringing-capacitance thickness correction`,
  citation: `${COHN_1955.citation}; ${WHEELER_1978.citation} (single-strip Z0 with thickness)`,
};

/** The thickness correction is quoted for thin strips; t/b ≤ 0.1 (recalled). */
const THICKNESS_VALIDITY: ValidityRange = { quantity: 't/b', min: 0, max: 0.1, method: 'the coupled-stripline thickness correction' };

/**
 * Even- and odd-mode impedances of edge-coupled striplines with thickness t [Ω].
 * Method: Cohn 1955 exact for t = 0; for t > 0 the coupling admittance of the thin strips is
 *   scaled by the fringing-capacitance ratio C′f(t)/C′f(0) around the thick single strip:
 *   1/Z0e = 1/Z0(t) − (C′f(t)/C′f(0))·(1/Z0(0) − 1/Z0e(0)),
 *   1/Z0o = 1/Z0(t) + (C′f(t)/C′f(0))·(1/Z0o(0) − 1/Z0(0))   (Cohn 1955, as quoted in handbooks; recalled).
 * Valid:  exact at t = 0; t/b ≤ 0.1 for the correction; tends to the single stripline as s → ∞.
 */
export function coupledStripline(w: number, s: number, b: number, t: number, er: number): { zEven: number; zOdd: number } {
  const thin = cohnCoupledStripline(w, s, b, er);
  if (t === 0) return thin;
  const single0 = cohnStripline(w, b, er);
  const singleT = stripline(w, b, t, er);
  const ratio = cohnFringingCapacitance(t, b) / cohnFringingCapacitance(0, b);
  return {
    zEven: 1 / (1 / singleT - ratio * (1 / single0 - 1 / thin.zEven)),
    zOdd: 1 / (1 / singleT + ratio * (1 / thin.zOdd - 1 / single0)),
  };
}

export const coupledStriplineModel: LineModel<CoupledStriplineSpec> = {
  kind: 'coupled-stripline',
  label: 'Edge-coupled stripline',
  description: 'Two side-by-side strips centred between two ground planes: a differential pair.',
  fields: [
    positiveLength('w', 'Strip width', 'Width of each strip.', 0.12e-3),
    positiveLength('s', 'Gap', 'Edge-to-edge gap between the strips.', 0.2e-3),
    positiveLength('b', 'Plane spacing', 'Distance between the two ground planes.', 0.5e-3),
    thicknessField(17.4e-6),
  ],
  methods: [{ id: 'cohn', ...METHOD }],
  validity: [THICKNESS_VALIDITY],
  isCoupled: true,
  validate(spec) {
    validateStriplineGeometry(spec);
    requirePositive('s', spec.s);
  },
  compute(spec) {
    const warnings: string[] = [];
    if (spec.t > 0) checkRange(warnings, THICKNESS_VALIDITY, spec.t / spec.b);
    const { zEven, zOdd } = coupledStripline(spec.w, spec.s, spec.b, spec.t, spec.er);
    return { z0: Math.sqrt(zEven * zOdd), erEff: spec.er, zEven, zOdd, erEffEven: spec.er, erEffOdd: spec.er, method: METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, s: spec.s + 2 * recession, b: spec.b + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
