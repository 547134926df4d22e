/**
 * Centred stripline: a strip of width w and thickness t midway between two
 * ground planes b apart, in one homogeneous dielectric.
 */
import { LineInputError } from '../errors';
import type { StriplineSpec } from '../types';
import { checkRange, requireLess, requireNonNegative, requirePositive, type ValidityRange } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import { IPC_2141, IPC_STRIPLINE_VALIDITY, ipcStripline } from './ipc-2141';
import { chooseMethod, type LineModel, type ModelOutput } from './line-model';
import { COHN_1954, WHEELER_1978, stripline } from './stripline-formulas';

const METHODS = [
  { id: 'cohn-wheeler', name: `${COHN_1954.name} / ${WHEELER_1978.name} (t > 0)`, citation: `${COHN_1954.citation}; ${WHEELER_1978.citation}` },
  { id: 'ipc-2141', ...IPC_2141 },
] as const;

/** Wheeler's 0.5 % claim holds for W′ = w/(b − t) below 10; Cohn's t = 0 result is exact for any width. */
export const WHEELER_VALIDITY: ValidityRange = { quantity: 'w/(b − t)', min: 0, max: 10, method: WHEELER_1978.name };

/** Checks the stripline rules shared by the centred and coupled kinds. */
export function validateStriplineGeometry(spec: { w: number; b: number; t: number }): void {
  requirePositive('w', spec.w);
  requirePositive('b', spec.b);
  requireNonNegative('t', spec.t);
  requireLess('t', spec.t, 'b', spec.b);
}

export const striplineModel: LineModel<StriplineSpec> = {
  kind: 'stripline',
  label: 'Stripline',
  description: 'A strip centred between two ground planes in one dielectric.',
  fields: [
    positiveLength('w', 'Strip width', 'Width of the strip.', 0.19e-3),
    positiveLength('b', 'Plane spacing', 'Distance between the two ground planes.', 0.5e-3),
    thicknessField(17.4e-6),
  ],
  methods: METHODS,
  validity: [WHEELER_VALIDITY],
  isCoupled: false,
  validate: validateStriplineGeometry,
  compute(spec): ModelOutput {
    const method = chooseMethod(METHODS, spec.method);
    const warnings: string[] = [];
    const info = { name: method.name, citation: method.citation };
    if (method.id === 'ipc-2141') {
      checkRange(warnings, IPC_STRIPLINE_VALIDITY[0], spec.w / spec.b);
      checkRange(warnings, IPC_STRIPLINE_VALIDITY[1], spec.t / spec.b);
      const line = ipcStripline(spec.w, spec.b, spec.t, spec.er);
      if (!(line.z0 > 0)) throw new LineInputError('w', 'is too wide for the IPC-2141 quick formula (it gives Z0 ≤ 0)');
      return { ...line, method: info, warnings };
    }
    if (spec.t > 0) checkRange(warnings, WHEELER_VALIDITY, spec.w / (spec.b - spec.t));
    return { z0: stripline(spec.w, spec.b, spec.t, spec.er), erEff: spec.er, method: info, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, b: spec.b + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
