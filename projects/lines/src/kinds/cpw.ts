/**
 * Coplanar waveguide: a centre strip w between two coplanar grounds, gaps g,
 * on a substrate of height h; optionally conductor-backed (ground under the substrate).
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import { LineInputError } from '../errors';
import { ellipticRatio } from '../math/elliptic';
import type { CpwSpec } from '../types';
import { checkRange, requireNonNegative, requirePositive, type ValidityRange } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import type { LineModel } from './line-model';

const METHOD = {
  name: 'Wen 1969 / Ghione–Naldi conformal mapping, Gupta et al. thickness correction',
  citation:
    'C. P. Wen, IEEE Trans. MTT-17, Dec. 1969, pp. 1087–1090; G. Ghione, C. U. Naldi, Electronics Letters 20(4), 1984, pp. 179–181 and 19(18), 1983 (conductor-backed); ' +
    'K. C. Gupta, R. Garg, I. Bahl, P. Bhartia, Microstrip Lines and Slotlines, 2nd ed., Artech House, 1996, ch. 7 (thickness)',
};

/** The thickness correction is a thin-conductor expansion; t/g ≤ 0.5 keeps it meaningful (common practice, no source). */
const THICKNESS_VALIDITY: ValidityRange = { quantity: 't/g', min: 0, max: 0.5, method: 'the CPW thickness correction' };

/** sinh(a)/sinh(b) for 0 < a < b without overflow for large arguments. */
function sinhRatio(a: number, b: number): number {
  return (Math.exp(a - b) * -Math.expm1(-2 * a)) / -Math.expm1(-2 * b);
}

/** Coefficient 1.25/π and 0.7 of the thickness correction (Gupta et al. 1996, ch. 7; recalled). */
const WIDENING = 1.25 / Math.PI;
const THICKNESS_PERMITTIVITY_COEFFICIENT = 0.7;

/**
 * CPW Z0 [Ω] and εeff.
 * Method: partial capacitances by conformal mapping. k0 = w/(w + 2g);
 *   open: k1 = sinh(πw/4h)/sinh(π(w + 2g)/4h), εeff = 1 + (εr − 1)/2·[K(k1)/K(k1′)]/[K(k0)/K(k0′)],
 *     Z0 = η0/(4√εeff)·K(k0′)/K(k0)  (Wen 1969; Ghione–Naldi 1984);
 *   conductor-backed: k3 = tanh(πw/4h)/tanh(π(w + 2g)/4h), q = [K(k3)/K(k3′)]/[K(k0)/K(k0′)],
 *     εeff = (1 + εr·q)/(1 + q), Z0 = η0/(2√εeff)/(K(k0)/K(k0′) + K(k3)/K(k3′))  (Ghione–Naldi 1983);
 *   t > 0: Δ = (1.25t/π)(1 + ln(4πw/t)), k0 from w + Δ and g − Δ,
 *     εeff,t = εeff − 0.7(εeff − 1)(t/g)/(K(k0)/K(k0′) + 0.7t/g)  (Gupta et al. 1996).
 * Valid:  ground planes wide against w + 2g; conformal mapping ≈ 1 % against quasi-static numerical results (recalled);
 *   t ≪ g for the thickness correction.
 */
export function coplanarWaveguide(w: number, g: number, h: number, t: number, er: number, grounded: boolean): { z0: number; erEff: number } {
  const thin = coplanarRatios(w, g, h, grounded);
  let erEff = grounded ? (1 + er * thin.backing) / (1 + thin.backing) : 1 + ((er - 1) / 2) * thin.backing;
  let ratio0 = thin.ratio0;
  if (t > 0) {
    const delta = WIDENING * t * (1 + Math.log((4 * Math.PI * w) / t));
    if (delta >= g) throw new LineInputError('t', 'is too thick for the gap g in the CPW thickness correction');
    const k0 = (w + delta) / (w + 2 * g - delta);
    ratio0 = ellipticRatio(k0);
    erEff -= (THICKNESS_PERMITTIVITY_COEFFICIENT * (erEff - 1) * (t / g)) / (thin.ratio0 + THICKNESS_PERMITTIVITY_COEFFICIENT * (t / g));
  }
  const z0 = grounded
    ? FREE_SPACE_IMPEDANCE / (2 * Math.sqrt(erEff) * (ratio0 + thin.backingRatio))
    : FREE_SPACE_IMPEDANCE / (4 * Math.sqrt(erEff) * ratio0);
  return { z0, erEff };
}

/** K(k)/K(k′) of the coplanar part and of the substrate (or backing) part, and the substrate share. */
function coplanarRatios(w: number, g: number, h: number, grounded: boolean): { ratio0: number; backingRatio: number; backing: number } {
  const ratio0 = ellipticRatio(w / (w + 2 * g));
  const a = (Math.PI * w) / (4 * h);
  const b = (Math.PI * (w + 2 * g)) / (4 * h);
  const k = grounded ? Math.tanh(a) / Math.tanh(b) : sinhRatio(a, b);
  const backingRatio = ellipticRatio(k);
  return { ratio0, backingRatio, backing: backingRatio / ratio0 };
}

export const cpwModel: LineModel<CpwSpec> = {
  kind: 'cpw',
  label: 'Coplanar waveguide',
  description: 'A centre strip between two coplanar grounds on a substrate, optionally with a ground plane underneath.',
  fields: [
    positiveLength('w', 'Centre strip width', 'Width of the centre strip.', 0.3e-3),
    positiveLength('g', 'Gap', 'Gap from the strip to each coplanar ground.', 0.15e-3),
    positiveLength('h', 'Substrate height', 'Substrate thickness.', 0.5e-3),
    thicknessField(34.8e-6),
    { name: 'grounded', label: 'Conductor-backed', description: 'Ground plane under the substrate (grounded CPW).', quantity: 'boolean', isLength: false, isOptional: true, defaultValue: false, group: 'geometry' },
  ],
  methods: [{ id: 'conformal-mapping', ...METHOD }],
  validity: [THICKNESS_VALIDITY],
  isCoupled: false,
  validate(spec) {
    requirePositive('w', spec.w);
    requirePositive('g', spec.g);
    requirePositive('h', spec.h);
    requireNonNegative('t', spec.t);
    if (spec.grounded !== undefined && typeof spec.grounded !== 'boolean') throw new LineInputError('grounded', 'must be true or false');
  },
  compute(spec) {
    const warnings: string[] = [];
    if (spec.t > 0) checkRange(warnings, THICKNESS_VALIDITY, spec.t / spec.g);
    return { ...coplanarWaveguide(spec.w, spec.g, spec.h, spec.t, spec.er, spec.grounded === true), method: METHOD, warnings };
  },
  recede(spec, recession) {
    // h is a conductor spacing only when a backing plane is there; otherwise its far side is bare dielectric.
    const h = spec.grounded === true ? spec.h + 2 * recession : spec.h;
    return { ...spec, w: spec.w - 2 * recession, g: spec.g + 2 * recession, h, t: Math.max(0, spec.t - 2 * recession) };
  },
};
