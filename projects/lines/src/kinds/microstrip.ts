/**
 * Surface microstrip: a strip of width w and thickness t on a substrate of
 * height h over a ground plane, air above.
 */
import { SPEED_OF_LIGHT } from '../constants';
import { LineInputError } from '../errors';
import type { MicrostripSpec } from '../types';
import { checkRange, requireNonNegative, requirePositive } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import { IPC_2141, IPC_MICROSTRIP_VALIDITY, ipcMicrostrip } from './ipc-2141';
import { chooseMethod, type LineModel, type ModelOutput } from './line-model';
import { DISPERSION_VALIDITY, KIRSCHNING_JANSEN_DISPERSION, dispersiveErEff, dispersiveImpedance, normalisedFrequency } from './microstrip-dispersion';
import { HAMMERSTAD_JENSEN, HAMMERSTAD_JENSEN_VALIDITY, hammerstadJensen } from './microstrip-hammerstad-jensen';

/**
 * Microstrip Z0 and εeff: static Hammerstad–Jensen with thickness and, when
 * a frequency is given, Kirschning–Jansen / Jansen–Kirschning dispersion.
 * Exported for embedded and coupled microstrip, which build on it.
 * Method: Hammerstad–Jensen 1980 (static); Kirschning–Jansen 1982, Jansen–Kirschning 1983 (dispersion).
 * Valid:  0.01 ≤ w/h ≤ 100, εr ≤ 128 static (0.2 %); dispersion 0.1 ≤ w/h ≤ 100, εr ≤ 20, h/λ0 ≤ 0.13.
 */
export function microstripLine(w: number, h: number, t: number, er: number, frequency: number | undefined, warnings: string[]): { z0: number; erEff: number } {
  const u = w / h;
  for (const range of HAMMERSTAD_JENSEN_VALIDITY) checkRange(warnings, range, range.quantity === 'er' ? er : u);
  const line = hammerstadJensen(w, h, t, er);
  if (frequency === undefined) return line;
  const [uRange, erRange, heightRange] = DISPERSION_VALIDITY;
  checkRange(warnings, uRange, u);
  checkRange(warnings, erRange, er);
  checkRange(warnings, heightRange, (h * frequency) / SPEED_OF_LIGHT);
  const fn = normalisedFrequency(frequency, h);
  const erEff = dispersiveErEff(u, er, line.erEff, fn);
  const z0 = dispersiveImpedance(u, er, line.erEff, erEff, line.z0, fn);
  if (!Number.isFinite(z0) || z0 <= 0) {
    // The Z0(f) fit's R13/R14 ratio can change sign for εr just above 1; keep the static Z0 rather than a NaN.
    warnings.push('Z0(f) dispersion is undefined for this εr; the static Z0 is shown.');
    return { z0: line.z0, erEff };
  }
  return { z0, erEff };
}

const METHODS = [
  { id: 'hammerstad-jensen', ...HAMMERSTAD_JENSEN },
  { id: 'ipc-2141', ...IPC_2141 },
] as const;

/** Built once: the live calculator must not rebuild these strings per keystroke. */
const DISPERSIVE_METHOD = {
  name: `${HAMMERSTAD_JENSEN.name} with ${KIRSCHNING_JANSEN_DISPERSION.name}`,
  citation: `${HAMMERSTAD_JENSEN.citation}; ${KIRSCHNING_JANSEN_DISPERSION.citation}`,
};

export const microstripModel: LineModel<MicrostripSpec> = {
  kind: 'microstrip',
  label: 'Microstrip',
  description: 'A strip on the surface of a substrate over a ground plane, air above.',
  fields: [
    positiveLength('w', 'Strip width', 'Width of the strip.', 0.3e-3),
    positiveLength('h', 'Dielectric height', 'Substrate thickness from the ground plane to the strip.', 0.17e-3),
    thicknessField(34.8e-6),
  ],
  methods: METHODS,
  validity: HAMMERSTAD_JENSEN_VALIDITY,
  isCoupled: false,
  validate(spec) {
    requirePositive('w', spec.w);
    requirePositive('h', spec.h);
    requireNonNegative('t', spec.t);
  },
  compute(spec): ModelOutput {
    const method = chooseMethod(METHODS, spec.method);
    const warnings: string[] = [];
    if (method.id === 'ipc-2141') {
      const u = spec.w / spec.h;
      for (const range of IPC_MICROSTRIP_VALIDITY) checkRange(warnings, range, range.quantity === 'er' ? spec.er : u);
      const line = ipcMicrostrip(spec.w, spec.h, spec.t, spec.er);
      if (!(line.z0 > 0)) throw new LineInputError('w', 'is too wide for the IPC-2141 quick formula (it gives Z0 ≤ 0)');
      return { z0: line.z0, erEff: line.erEff, method: IPC_2141, warnings };
    }
    const line = microstripLine(spec.w, spec.h, spec.t, spec.er, spec.frequency, warnings);
    return { z0: line.z0, erEff: line.erEff, method: spec.frequency === undefined ? HAMMERSTAD_JENSEN : DISPERSIVE_METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, h: spec.h + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
