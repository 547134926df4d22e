/**
 * Edge-coupled microstrip: two strips of width w, edge gap s, on a substrate
 * of height h over a ground plane.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import type { CoupledMicrostripSpec } from '../types';
import { checkRange, requireNonNegative, requirePositive, type ValidityRange } from '../validation';
import { positiveLength, thicknessField } from './field-descriptions';
import type { LineModel } from './line-model';
import { effectivePermittivity, HAMMERSTAD_JENSEN } from './microstrip-hammerstad-jensen';
import { microstripLine } from './microstrip';

const METHOD = {
  name: 'Kirschning–Jansen 1984 (static) on Hammerstad–Jensen 1980',
  citation:
    'M. Kirschning, R. H. Jansen, "Accurate wide-range design equations for the frequency-dependent characteristic of parallel coupled microstrip lines", IEEE Trans. MTT-32, Jan. 1984, pp. 83–90 (with the 1985 correction); ' +
    `${HAMMERSTAD_JENSEN.citation} (single-line Z0 and εeff, with thickness)`,
};

const KJ = 'Kirschning–Jansen 1984';
/** Published range of the coupled-line equations; about 1 % claimed inside it (recalled). */
const COUPLED_MICROSTRIP_VALIDITY: readonly ValidityRange[] = [
  { quantity: 'w/h', min: 0.1, max: 10, method: KJ },
  { quantity: 's/h', min: 0.1, max: 10, method: KJ },
  { quantity: 'er', min: 1, max: 18, method: KJ },
];

/**
 * Even- and odd-mode impedances [Ω] and effective permittivities of coupled microstrip.
 * Method: Kirschning–Jansen 1984, static part: εeff,e from Hammerstad–Jensen's εeff at the
 *   modified width v = u(20 + g²)/(10 + g²) + g·e^(−g); εeff,o = (½(εr+1) + a_o − εeff)·exp(−c_o·g^d_o) + εeff;
 *   Z0e,o = Z0·√(εeff/εeff,e,o)/(1 − Z0·√εeff·Q4,Q10/η0) with Q1…Q10 of the paper (u = w/h, g = s/h;
 *   coefficients recalled from memory). Thickness enters only through the single line's Z0 and εeff
 *   (Hammerstad–Jensen with t); the coupling terms are the zero-thickness ones.
 * Valid:  0.1 ≤ w/h ≤ 10, 0.1 ≤ s/h ≤ 10, 1 ≤ εr ≤ 18; tends to the single line as s → ∞.
 */
export function coupledMicrostrip(w: number, s: number, h: number, t: number, er: number): { zEven: number; zOdd: number; erEffEven: number; erEffOdd: number } {
  const u = w / h;
  const g = s / h;
  const single = microstripLine(w, h, t, er, undefined, []);
  const erEff = single.erEff;
  const v = (u * (20 + g * g)) / (10 + g * g) + g * Math.exp(-g);
  // The even mode's εeff is Hammerstad–Jensen's at v, shifted by the thickness correction of the single line.
  const erEffEven = effectivePermittivity(v, er) + (erEff - effectivePermittivity(u, er));
  const ao = 0.7287 * (erEff - (er + 1) / 2) * (1 - Math.exp(-0.179 * u));
  const bo = (0.747 * er) / (0.15 + er);
  const co = bo - (bo - 0.207) * Math.exp(-0.414 * u);
  const dO = 0.593 + 0.694 * Math.exp(-0.562 * u);
  const erEffOdd = ((er + 1) / 2 + ao - erEff) * Math.exp(-co * Math.pow(g, dO)) + erEff;

  const q1 = 0.8695 * Math.pow(u, 0.194);
  const q2 = 1 + 0.7519 * g + 0.189 * Math.pow(g, 2.31);
  const q3 = 0.1975 + Math.pow(16.6 + Math.pow(8.4 / g, 6), -0.387) + Math.log(Math.pow(g, 10) / (1 + Math.pow(g / 3.4, 10))) / 241;
  const q4 = ((2 * q1) / q2) / (Math.exp(-g) * Math.pow(u, q3) + (2 - Math.exp(-g)) * Math.pow(u, -q3));
  const q5 = 1.794 + 1.14 * Math.log(1 + 0.638 / (g + 0.517 * Math.pow(g, 2.43)));
  const q6 = 0.2305 + Math.log(Math.pow(g, 10) / (1 + Math.pow(g / 5.8, 10))) / 281.3 + Math.log(1 + 0.598 * Math.pow(g, 1.154)) / 5.1;
  const q7 = (10 + 190 * g * g) / (1 + 82.3 * g * g * g);
  const q8 = Math.exp(-6.5 - 0.95 * Math.log(g) - Math.pow(g / 0.15, 5));
  const q9 = Math.log(q7) * (q8 + 1 / 16.5);
  const q10 = (q2 * q4 - q5 * Math.exp(Math.log(u) * q6 * Math.pow(u, -q9))) / q2;

  const airShare = (single.z0 * Math.sqrt(erEff)) / FREE_SPACE_IMPEDANCE;
  return {
    zEven: (single.z0 * Math.sqrt(erEff / erEffEven)) / (1 - airShare * q4),
    zOdd: (single.z0 * Math.sqrt(erEff / erEffOdd)) / (1 - airShare * q10),
    erEffEven,
    erEffOdd,
  };
}

export const coupledMicrostripModel: LineModel<CoupledMicrostripSpec> = {
  kind: 'coupled-microstrip',
  label: 'Edge-coupled microstrip',
  description: 'Two side-by-side surface strips over a ground plane: a differential pair.',
  fields: [
    positiveLength('w', 'Strip width', 'Width of each strip.', 0.2e-3),
    positiveLength('s', 'Gap', 'Edge-to-edge gap between the strips.', 0.2e-3),
    positiveLength('h', 'Dielectric height', 'Substrate thickness from the ground plane to the strips.', 0.17e-3),
    thicknessField(34.8e-6),
  ],
  methods: [{ id: 'kirschning-jansen', ...METHOD }],
  validity: COUPLED_MICROSTRIP_VALIDITY,
  isCoupled: true,
  validate(spec) {
    requirePositive('w', spec.w);
    requirePositive('s', spec.s);
    requirePositive('h', spec.h);
    requireNonNegative('t', spec.t);
  },
  compute(spec) {
    const warnings: string[] = [];
    const [uRange, gRange, erRange] = COUPLED_MICROSTRIP_VALIDITY;
    checkRange(warnings, uRange, spec.w / spec.h);
    checkRange(warnings, gRange, spec.s / spec.h);
    checkRange(warnings, erRange, spec.er);
    const modes = coupledMicrostrip(spec.w, spec.s, spec.h, spec.t, spec.er);
    return { z0: Math.sqrt(modes.zEven * modes.zOdd), erEff: modes.erEffOdd, ...modes, method: METHOD, warnings };
  },
  recede(spec, recession) {
    return { ...spec, w: spec.w - 2 * recession, s: spec.s + 2 * recession, h: spec.h + 2 * recession, t: Math.max(0, spec.t - 2 * recession) };
  },
};
