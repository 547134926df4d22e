/**
 * Coaxial line: inner conductor of diameter d inside a shield of inner diameter D.
 */
import { SPEED_OF_LIGHT } from '../constants';
import type { CoaxSpec } from '../types';
import { requireGreater, requirePositive } from '../validation';
import { coaxImpedance, EXACT_TEM } from './exact-tem';
import { positiveLength } from './field-descriptions';
import type { LineModel, ModelOutput } from './line-model';

/**
 * TE11 cut-off frequency [Hz]: fc ≈ c0/(π·(a + b)·√εr), a, b the radii.
 * Method: Pozar, Microwave Engineering, 4th ed., §3.4 (the approximate cut-off wave number kc ≈ 2/(a + b)).
 * Valid:  an approximation, within a few per cent for b/a up to about 5.
 */
export function coaxCutoffFrequency(d: number, D: number, er: number): number {
  return SPEED_OF_LIGHT / (Math.PI * ((d + D) / 2) * Math.sqrt(er));
}

/**
 * Breakdown-limited peak voltage [V]: the field is largest at the inner conductor,
 * E(a) = V/(a·ln(b/a)), so Vpeak = Emax·a·ln(b/a); the matched CW power at that peak is Vpeak²/(2Z0).
 * Method: electrostatics of the coaxial line (e.g. Pozar §3.4 field solution); no safety margin.
 * Valid:  smooth, clean conductors; ignores heating (the usual limit at high frequency), altitude, VSWR and corona.
 */
export function coaxVoltageRating(d: number, D: number, dielectricStrength: number, z0: number): { peakVoltage: number; maxPower: number } {
  const peakVoltage = dielectricStrength * (d / 2) * Math.log(D / d);
  return { peakVoltage, maxPower: (peakVoltage * peakVoltage) / (2 * z0) };
}

/** Shown whenever a voltage or power rating is computed. */
export const HIGH_POWER_CAUTION =
  'Caution: high voltage and RF power are dangerous. The voltage and power figures are breakdown estimates without margin or heating limits; follow local codes and licensed practice.';

export const coaxModel: LineModel<CoaxSpec> = {
  kind: 'coax',
  label: 'Coaxial line',
  description: 'A round inner conductor centred in a round shield, filled with one dielectric.',
  fields: [
    positiveLength('d', 'Inner conductor diameter', 'Outer diameter of the centre conductor.', 0.9e-3),
    positiveLength('D', 'Shield inner diameter', 'Inner diameter of the shield (outer diameter of the dielectric).', 3.1e-3),
    { name: 'dielectricStrength', label: 'Dielectric strength', description: 'Breakdown field of the insulation, for a voltage and power estimate.', quantity: 'electricField', isLength: false, isOptional: true, defaultValue: 20e6, min: 0, minExclusive: true, group: 'material' },
  ],
  methods: [{ id: 'exact', ...EXACT_TEM }],
  validity: [],
  materialDefaults: { er: 2.25, tanDelta: 0.0002 },
  isCoupled: false,
  validate(spec) {
    requirePositive('d', spec.d);
    requirePositive('D', spec.D);
    requireGreater('D', spec.D, 'd', spec.d);
    if (spec.dielectricStrength !== undefined) requirePositive('dielectricStrength', spec.dielectricStrength);
  },
  compute(spec): ModelOutput {
    const z0 = coaxImpedance(spec.d, spec.D, spec.er);
    const cutoffFrequency = coaxCutoffFrequency(spec.d, spec.D, spec.er);
    const warnings: string[] = [];
    if (spec.frequency !== undefined && spec.frequency >= cutoffFrequency) {
      warnings.push(`frequency is above the TE11 cut-off (${(cutoffFrequency / 1e9).toPrecision(4)} GHz): the line is no longer single-mode.`);
    }
    const extras = { cutoffFrequency, ...(spec.dielectricStrength === undefined ? {} : coaxVoltageRating(spec.d, spec.D, spec.dielectricStrength, z0)) };
    if (spec.dielectricStrength !== undefined) warnings.push(HIGH_POWER_CAUTION);
    return { z0, erEff: spec.er, method: EXACT_TEM, warnings, extras };
  },
  recede(spec, recession) {
    return { ...spec, d: spec.d - 2 * recession, D: spec.D + 2 * recession };
  },
};
