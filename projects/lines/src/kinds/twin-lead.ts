/**
 * Twin lead: two parallel round wires of diameter d, centre spacing s.
 */
import type { TwinLeadSpec } from '../types';
import { requireGreater, requirePositive } from '../validation';
import { EXACT_TEM, twinLeadImpedance } from './exact-tem';
import { positiveLength } from './field-descriptions';
import type { LineModel } from './line-model';

export const twinLeadModel: LineModel<TwinLeadSpec> = {
  kind: 'twin-lead',
  label: 'Twin lead',
  description: 'Two parallel round wires in one homogeneous dielectric.',
  fields: [
    positiveLength('d', 'Wire diameter', 'Diameter of each wire.', 1e-3),
    positiveLength('s', 'Centre spacing', 'Centre-to-centre spacing of the wires.', 7.5e-3),
  ],
  methods: [{ id: 'exact', ...EXACT_TEM }],
  validity: [],
  materialDefaults: { er: 1.15, tanDelta: 0.0005 },
  isCoupled: false,
  validate(spec) {
    requirePositive('d', spec.d);
    requirePositive('s', spec.s);
    requireGreater('s', spec.s, 'd', spec.d);
  },
  compute(spec) {
    return { z0: twinLeadImpedance(spec.d, spec.s, spec.er), erEff: spec.er, method: EXACT_TEM, warnings: [] };
  },
  recede(spec, recession) {
    // Both wire surfaces recede: the diameter shrinks, the centres stay put.
    return { ...spec, d: spec.d - 2 * recession };
  },
};
