/**
 * Offset (asymmetric) stripline: a strip h1 above the lower plane and h2
 * below the upper plane, in one homogeneous dielectric.
 */
import type { OffsetStriplineSpec } from '../types';
import { checkRange, requireNonNegative, requirePositive, type ValidityRange } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import type { LineModel } from './line-model';
import { WHEELER_VALIDITY } from './stripline';
import { stripline, WHEELER_1978 } from './stripline-formulas';

const METHOD = {
  name: 'Parallel combination of two centred striplines (Cohn 1954 / Wheeler 1978)',
  citation:
    'Each half of the strip sees one plane as in a centred stripline of spacing 2h + t: Z0 = 2·Z1·Z2/(Z1 + Z2); as collected for the offset strip line in B. C. Wadell, Transmission Line Design Handbook, Artech House, 1991, ch. 3 (section not checked); ' +
    WHEELER_1978.citation,
};

/** The combination is exact for h1 = h2 and drifts with asymmetry; a few per cent is typical up to about 3:1 (no published figure known to us). */
const ASYMMETRY_VALIDITY: ValidityRange = { quantity: 'h2/h1', min: 1 / 3, max: 3, method: 'the parallel-combination offset-stripline method' };

/**
 * Offset stripline impedance [Ω].
 * Method: C = (C1 + C2)/2, each Ci the capacitance of a centred stripline of spacing bi = 2hi + t
 *   (so Z0 = 2·Z1·Z2/(Z1 + Z2)), Z1, Z2 by Cohn 1954 (t = 0) or Wheeler 1978.
 * Valid:  exact for h1 = h2; approximate otherwise (the two halves' fields interact through the strip edges).
 */
export function offsetStripline(w: number, h1: number, h2: number, t: number, er: number): number {
  const z1 = stripline(w, 2 * h1 + t, t, er);
  const z2 = stripline(w, 2 * h2 + t, t, er);
  return (2 * z1 * z2) / (z1 + z2);
}

export const offsetStriplineModel: LineModel<OffsetStriplineSpec> = {
  kind: 'offset-stripline',
  label: 'Offset stripline',
  description: 'A strip between two ground planes, nearer to one of them, in one dielectric.',
  fields: [
    positiveLength('w', 'Strip width', 'Width of the strip.', 0.15e-3),
    positiveLength('h1', 'Gap to lower plane', 'Dielectric between the lower plane and the strip.', 0.15e-3),
    positiveLength('h2', 'Gap to upper plane', 'Dielectric between the strip and the upper plane.', 0.3e-3),
    thicknessField(17.4e-6),
  ],
  methods: [{ id: 'parallel-combination', ...METHOD }],
  validity: [ASYMMETRY_VALIDITY, WHEELER_VALIDITY],
  isCoupled: false,
  validate(spec) {
    requirePositive('w', spec.w);
    requirePositive('h1', spec.h1);
    requirePositive('h2', spec.h2);
    requireNonNegative('t', spec.t);
  },
  compute(spec) {
    const warnings: string[] = [];
    checkRange(warnings, ASYMMETRY_VALIDITY, spec.h2 / spec.h1);
    if (spec.t > 0) checkRange(warnings, WHEELER_VALIDITY, spec.w / (2 * Math.min(spec.h1, spec.h2)));
    return { z0: offsetStripline(spec.w, spec.h1, spec.h2, spec.t, spec.er), erEff: spec.er, method: METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, h1: spec.h1 + 2 * recession, h2: spec.h2 + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
