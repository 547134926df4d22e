/**
 * Wideband causal dielectric from one measured Dk/Df point.
 */

/** Decades of the model's loss band, ω1 = 10^4 and ω2 = 10^12 rad/s, the values the paper suggests for FR-4. */
const LOWER_DECADE = 4;
const UPPER_DECADE = 12;

export const DJORDJEVIC_SARKAR = {
  name: 'Djordjevic–Sarkar 2001 wideband dielectric',
  citation:
    'A. R. Djordjevic, R. M. Biljić, V. D. Likar-Smiljanić, T. K. Sarkar, "Wideband frequency-domain characterization of FR-4 and time-domain causality", IEEE Trans. EMC 43(4), 2001, pp. 662–667',
};

/** log10((ω2 + jω)/(ω1 + jω)) / (m2 − m1), as {re, im}. */
function bandShape(frequency: number): { re: number; im: number } {
  const omega = 2 * Math.PI * frequency;
  const omega1 = 10 ** LOWER_DECADE;
  const omega2 = 10 ** UPPER_DECADE;
  // log of a quotient of complex numbers: ln|z2/z1| + j(arg z2 − arg z1).
  const re = 0.5 * Math.log((omega2 * omega2 + omega * omega) / (omega1 * omega1 + omega * omega));
  const im = Math.atan2(omega, omega2) - Math.atan2(omega, omega1);
  const scale = 1 / (Math.LN10 * (UPPER_DECADE - LOWER_DECADE));
  return { re: re * scale, im: im * scale };
}

/**
 * Relative permittivity and loss tangent at `frequency`, given Dk and Df measured at `referenceFrequency`.
 * Method: Djordjevic et al. 2001: εr(ω) = ε∞ + Δε/(m2 − m1)·log10((ω2 + jω)/(ω1 + jω)),
 *   with ω1 = 10⁴, ω2 = 10¹² rad/s; Δε and ε∞ fitted so that εr(ω_ref) = Dk·(1 − j·Df).
 * Valid:  ω1 ≪ ω ≪ ω2 (about 10 kHz to 100 GHz); Df roughly constant over the band, as in FR-4-type laminates.
 */
export function djordjevicSarkar(er: number, tanDelta: number, referenceFrequency: number, frequency: number): { er: number; tanDelta: number } {
  const reference = bandShape(referenceFrequency);
  // εr = ε' − jε''; the band shape's imaginary part is negative, so Δε comes out positive.
  const deltaEpsilon = (-er * tanDelta) / reference.im;
  const epsilonInfinity = er - deltaEpsilon * reference.re;
  const at = bandShape(frequency);
  const real = epsilonInfinity + deltaEpsilon * at.re;
  return { er: real, tanDelta: (-deltaEpsilon * at.im) / real };
}
