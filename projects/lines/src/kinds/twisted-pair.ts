/**
 * Twisted pair: two insulated round wires of diameter d, centre spacing s,
 * twisted `twistsPerMeter` times per metre; the insulation only partly fills
 * the space around them.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import type { TwistedPairSpec } from '../types';
import { checkRange, requireGreater, requireNonNegative, requirePositive, type ValidityRange } from '../validation';
import { positiveLength } from './field-descriptions';
import type { LineModel } from './line-model';

const METHOD = {
  name: 'Lefferson 1971 twist-angle model',
  citation: 'P. Lefferson, "Twisted magnet wire transmission line", IEEE Trans. Parts, Hybrids and Packaging PHP-7, Dec. 1971, pp. 148–154',
};

/** Filling-factor fit q = 0.25 + 0.0004·θ² (θ in degrees); coefficients recalled from memory. */
const FILL_AT_ZERO_TWIST = 0.25;
const FILL_PER_DEGREE_SQUARED = 0.0004;

/** q reaches 1 near θ = 43°; the fit is used up to 45° (Lefferson's measurements, recalled). */
const TWIST_VALIDITY: ValidityRange = { quantity: 'twist angle θ [°]', min: 0, max: 45, method: METHOD.name };

/** Twist angle θ [°] of each wire's helix: tan θ = π·s·T (helix radius s/2, pitch 1/T). */
export function twistAngle(s: number, twistsPerMeter: number): number {
  return (Math.atan(Math.PI * s * twistsPerMeter) * 180) / Math.PI;
}

/**
 * Twisted-pair εeff and Z0 [Ω].
 * Method: Lefferson 1971: εeff = 1 + q·(εr − 1), q = 0.25 + 0.0004·θ², θ = atan(π·s·T) in degrees;
 *   Z0 = η0/(π√εeff)·acosh(s/d) (the two-wire result in the effective medium).
 * Valid:  θ ≤ 45°, enamel/thin-insulated wires touching (s ≈ d + twice the insulation); q capped at 1.
 *   Delay is per metre of pair; the helix makes each wire 1/cos θ longer, which the model does not add.
 */
export function lefferson(d: number, s: number, twistsPerMeter: number, er: number): { z0: number; erEff: number; angle: number } {
  const angle = twistAngle(s, twistsPerMeter);
  const fill = Math.min(1, FILL_AT_ZERO_TWIST + FILL_PER_DEGREE_SQUARED * angle * angle);
  const erEff = 1 + fill * (er - 1);
  return { z0: (FREE_SPACE_IMPEDANCE / (Math.PI * Math.sqrt(erEff))) * Math.acosh(s / d), erEff, angle };
}

export const twistedPairModel: LineModel<TwistedPairSpec> = {
  kind: 'twisted-pair',
  label: 'Twisted pair',
  description: 'Two insulated wires twisted together; the insulation partly fills the field region.',
  fields: [
    positiveLength('d', 'Wire diameter', 'Diameter of each bare conductor.', 0.51e-3),
    positiveLength('s', 'Centre spacing', 'Centre-to-centre spacing (wire diameter plus both insulation walls when touching).', 0.9e-3),
    { name: 'twistsPerMeter', label: 'Twists per metre', description: 'Full twists per metre of pair.', quantity: 'perLength', isLength: false, isOptional: false, defaultValue: 40, min: 0, minExclusive: false, group: 'geometry' },
  ],
  methods: [{ id: 'lefferson', ...METHOD }],
  validity: [TWIST_VALIDITY],
  materialDefaults: { er: 2.3, tanDelta: 0.0005 },
  isCoupled: false,
  validate(spec) {
    requirePositive('d', spec.d);
    requirePositive('s', spec.s);
    requireGreater('s', spec.s, 'd', spec.d);
    requireNonNegative('twistsPerMeter', spec.twistsPerMeter);
  },
  compute(spec) {
    const { z0, erEff, angle } = lefferson(spec.d, spec.s, spec.twistsPerMeter, spec.er);
    const warnings: string[] = [];
    checkRange(warnings, TWIST_VALIDITY, angle);
    return { z0, erEff, method: METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, d: spec.d - 2 * recession };
  },
};
