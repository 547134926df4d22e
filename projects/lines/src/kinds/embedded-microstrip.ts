/**
 * Embedded (covered) microstrip: a surface microstrip under a dielectric
 * cover of thickness `cover` (solder mask, coating or a further laminate).
 */
import type { EmbeddedMicrostripSpec } from '../types';
import { requireAtLeast, requireNonNegative, requirePositive } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import type { LineModel } from './line-model';
import { microstripLine } from './microstrip';
import { effectivePermittivity, HAMMERSTAD_JENSEN, HAMMERSTAD_JENSEN_VALIDITY } from './microstrip-hammerstad-jensen';

const METHOD = {
  name: 'Hammerstad–Jensen 1980 with an exponential cover correction (IPC-2141A form)',
  citation:
    `${HAMMERSTAD_JENSEN.citation}; cover decay exp(−1.55·cover/h) as in the embedded-microstrip formula of IPC-2141A, 2004 (coefficient recalled from memory). ` +
    'No published accuracy for this combination: expect a few per cent in εeff (about 1–2 % in Z0) for solder-mask-like covers; confirm with a field solver.',
};

/** Decay constant of the cover's effect with cover/h, from IPC-2141A's embedded microstrip (recalled). */
const COVER_DECAY = 1.55;

/**
 * Static εeff of the strip under an infinitely thick cover: the substrate's share q of the
 * field (the filling factor of the uncovered line, thickness included) stays in the substrate,
 * the rest is in the cover: εeff∞ = εc + q·(εr − εc). With εc = 1 this is the uncovered line.
 */
function fullyCoveredErEff(u: number, er: number, erCover: number, surfaceErEff: number): number {
  if (er > 1) return erCover + ((surfaceErEff - 1) / (er - 1)) * (er - erCover);
  // Air substrate: the share is taken from Hammerstad–Jensen with the cover's permittivity instead.
  if (erCover === 1) return 1;
  const fill = (effectivePermittivity(u, erCover) - 1) / (erCover - 1);
  return erCover + fill * (er - erCover);
}

/**
 * Embedded microstrip Z0 [Ω] and εeff.
 * Method: εeff = εeff,ms + (εeff∞ − εeff,ms,static)·(1 − exp(−1.55·cover/h)), εeff,ms by
 *   Hammerstad–Jensen (with dispersion when a frequency is given), Z0 = Z0,ms·√(εeff,ms/εeff)
 *   (a cover changes the capacitance, not the air impedance).
 * Valid:  as Hammerstad–Jensen; exact limits cover = 0 and εc = 1 (the uncovered line) and
 *   cover → ∞ with εc = εr (a homogeneous medium, εeff = εr); accuracy between them not published.
 */
export function embeddedMicrostrip(spec: EmbeddedMicrostripSpec, warnings: string[]): { z0: number; erEff: number } {
  const erCover = spec.erCover ?? spec.er;
  const surface = microstripLine(spec.w, spec.h, spec.t, spec.er, spec.frequency, warnings);
  const surfaceStatic = spec.frequency === undefined ? surface : microstripLine(spec.w, spec.h, spec.t, spec.er, undefined, []);
  const u = spec.w / spec.h;
  const coverShare = 1 - Math.exp((-COVER_DECAY * spec.cover) / spec.h);
  const erEff = surface.erEff + (fullyCoveredErEff(u, spec.er, erCover, surfaceStatic.erEff) - surfaceStatic.erEff) * coverShare;
  return { z0: surface.z0 * Math.sqrt(surface.erEff / erEff), erEff };
}

export const embeddedMicrostripModel: LineModel<EmbeddedMicrostripSpec> = {
  kind: 'embedded-microstrip',
  label: 'Embedded microstrip',
  description: 'A microstrip under a dielectric cover (solder mask, coating or laminate).',
  fields: [
    positiveLength('w', 'Strip width', 'Width of the strip.', 0.3e-3),
    positiveLength('h', 'Dielectric height', 'Substrate thickness from the ground plane to the strip.', 0.17e-3),
    thicknessField(34.8e-6),
    { ...positiveLength('cover', 'Cover thickness', 'Dielectric above the substrate surface (e.g. solder mask).', 50e-6), min: 0, minExclusive: false },
    { name: 'erCover', label: 'Cover Dk', description: 'Relative permittivity of the cover; defaults to the substrate Dk.', quantity: 'relativePermittivity', isLength: false, isOptional: true, defaultValue: 3.8, min: 1, minExclusive: false, group: 'material' },
  ],
  methods: [{ id: 'hammerstad-jensen-cover', ...METHOD }],
  validity: HAMMERSTAD_JENSEN_VALIDITY,
  isCoupled: false,
  validate(spec) {
    requirePositive('w', spec.w);
    requirePositive('h', spec.h);
    requireNonNegative('t', spec.t);
    requireNonNegative('cover', spec.cover);
    if (spec.erCover !== undefined) requireAtLeast('erCover', spec.erCover, 1);
  },
  compute(spec) {
    const warnings: string[] = [];
    if (spec.cover > 0 && spec.cover < spec.t) warnings.push('cover is thinner than the strip: the strip top is not covered, and the model assumes it is.');
    return { ...embeddedMicrostrip(spec, warnings), method: METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, h: spec.h + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
