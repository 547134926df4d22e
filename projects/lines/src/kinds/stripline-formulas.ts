/**
 * Stripline results shared by the stripline, offset-stripline and
 * coupled-stripline kinds: Cohn's exact zero-thickness solutions, Wheeler's
 * finite-thickness formula and Cohn's fringing capacitance of a thick strip.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import { ellipticRatio } from '../math/elliptic';

export const COHN_1954 = {
  name: 'Cohn 1954 (exact, zero thickness)',
  citation: 'S. B. Cohn, "Characteristic impedance of the shielded-strip transmission line", IRE Trans. MTT-2, July 1954, pp. 52–57',
};

export const WHEELER_1978 = {
  name: 'Wheeler 1978',
  citation: 'H. A. Wheeler, "Transmission-line properties of a strip line between parallel planes", IEEE Trans. MTT-26, Nov. 1978, pp. 866–876',
};

export const COHN_1955 = {
  name: 'Cohn 1955 (exact, zero thickness)',
  citation: 'S. B. Cohn, "Shielded coupled-strip transmission line", IRE Trans. MTT-3, Oct. 1955, pp. 29–38',
};

/**
 * Centred stripline with a zero-thickness strip [Ω].
 * Method: Cohn 1954, conformal mapping: Z0 = η0/(4√εr)·K(k′)/K(k), k = tanh(πw/2b), k′ = sech(πw/2b).
 * Valid:  exact for t = 0 and infinitely wide planes; any w/b.
 */
export function cohnStripline(w: number, b: number, er: number): number {
  const x = (Math.PI * w) / (2 * b);
  return FREE_SPACE_IMPEDANCE / (4 * Math.sqrt(er) * ellipticRatio(Math.tanh(x), 1 / Math.cosh(x)));
}

/** The constant 6.27 and the fringing coefficients 0.0796 and 1.1 of Wheeler's formula (1978, eqs. as quoted by Wadell 1991, recalled). */
const WHEELER_CONSTANT = 6.27;
const WHEELER_FRINGE = 0.0796;
const WHEELER_FRINGE_OFFSET = 1.1;

/**
 * Centred stripline with a strip of thickness t [Ω].
 * Method: Wheeler 1978: Z0 = η0/(4π√εr)·ln(1 + (4/πW′)·(8/πW′ + √((8/πW′)² + 6.27))),
 *   W′ = (w + Δw)/(b − t), Δw/(b − t) = x/(π(1 − x))·(1 − ½ln((x/(2 − x))² + (0.0796x/(w/b + 1.1x))^m)),
 *   m = 2/(1 + (2/3)·x/(1 − x)), x = t/b.
 * Valid:  0 ≤ t < b; 0.5 % claimed for W′ < 10 (coefficients recalled, not checked against the text).
 */
export function wheelerStripline(w: number, b: number, t: number, er: number): number {
  let widthRatio = w / (b - t);
  if (t > 0) {
    const x = t / b;
    const m = 2 / (1 + ((2 / 3) * x) / (1 - x));
    const fringe = (x / (2 - x)) ** 2 + Math.pow((WHEELER_FRINGE * x) / (w / b + WHEELER_FRINGE_OFFSET * x), m);
    widthRatio += (x / (Math.PI * (1 - x))) * (1 - 0.5 * Math.log(fringe));
  }
  const a = 8 / (Math.PI * widthRatio);
  const argument = 1 + (4 / (Math.PI * widthRatio)) * (a + Math.sqrt(a * a + WHEELER_CONSTANT));
  return (FREE_SPACE_IMPEDANCE / (4 * Math.PI * Math.sqrt(er))) * Math.log(argument);
}

/**
 * Centred stripline: Cohn's exact result when t = 0, Wheeler 1978 when t > 0.
 * Method: Cohn 1954 / Wheeler 1978 (see above). Valid: 0 ≤ t < b.
 */
export function stripline(w: number, b: number, t: number, er: number): number {
  return t === 0 ? cohnStripline(w, b, er) : wheelerStripline(w, b, t, er);
}

/**
 * Fringing capacitance of one edge of a thick semi-infinite strip centred between planes, C′f/ε (dimensionless).
 * Method: Cohn 1954: C′f/ε = (1/π)·(2/(1 − x)·ln(1/(1 − x) + 1) − (1/(1 − x) − 1)·ln(1/(1 − x)² − 1)), x = t/b.
 * Valid:  0 ≤ t < b; gives 2·ln2/π = 0.4413 at t = 0.
 */
export function cohnFringingCapacitance(t: number, b: number): number {
  const y = 1 / (1 - t / b);
  const thickPart = y === 1 ? 0 : (y - 1) * Math.log(y * y - 1);
  return (2 * y * Math.log(y + 1) - thickPart) / Math.PI;
}

/**
 * Even- and odd-mode impedances of edge-coupled zero-thickness striplines [Ω].
 * Method: Cohn 1955: Z0e,o = η0/(4√εr)·K(k′)/K(k), k_e = tanh(πw/2b)·tanh(π(w + s)/2b),
 *   k_o = tanh(πw/2b)·coth(π(w + s)/2b).
 * Valid:  exact for t = 0, strips centred between the planes, any w/b and s/b.
 */
export function cohnCoupledStripline(w: number, s: number, b: number, er: number): { zEven: number; zOdd: number } {
  const a = Math.tanh((Math.PI * w) / (2 * b));
  const c = Math.tanh((Math.PI * (w + s)) / (2 * b));
  const scale = FREE_SPACE_IMPEDANCE / (4 * Math.sqrt(er));
  return { zEven: scale / ellipticRatio(a * c), zOdd: scale / ellipticRatio(a / c) };
}
