/**
 * A round wire of diameter d whose centre is at height h above a ground plane.
 */
import type { WireOverGroundSpec } from '../types';
import { requireGreater, requirePositive } from '../validation';
import { EXACT_TEM, wireOverGroundImpedance } from './exact-tem';
import { positiveLength } from './field-descriptions';
import type { LineModel } from './line-model';

export const wireOverGroundModel: LineModel<WireOverGroundSpec> = {
  kind: 'wire-over-ground',
  label: 'Wire over ground',
  description: 'A round wire parallel to an infinite ground plane, in one homogeneous dielectric.',
  fields: [
    positiveLength('d', 'Wire diameter', 'Diameter of the wire.', 1e-3),
    positiveLength('h', 'Height of centre', 'Height of the wire centre above the ground plane.', 2e-3),
  ],
  methods: [{ id: 'exact', ...EXACT_TEM }],
  validity: [],
  materialDefaults: { er: 1, tanDelta: 0 },
  isCoupled: false,
  validate(spec) {
    requirePositive('d', spec.d);
    requirePositive('h', spec.h);
    // The wire must not touch the plane: its centre height exceeds its radius.
    requireGreater('h', 2 * spec.h, 'd/2 (the wire must clear the plane)', spec.d);
  },
  compute(spec) {
    return { z0: wireOverGroundImpedance(spec.d, spec.h, spec.er), erEff: spec.er, method: EXACT_TEM, warnings: [] };
  },
  recede(spec, recession) {
    // The wire shrinks and the plane drops: the centre moves away from the plane surface by `recession`.
    return { ...spec, d: spec.d - 2 * recession, h: spec.h + recession };
  },
};
