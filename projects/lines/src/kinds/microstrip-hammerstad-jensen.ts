/**
 * Static microstrip model of E. Hammerstad and Ø. Jensen, "Accurate models for
 * microstrip computer-aided design", IEEE MTT-S Int. Microwave Symp. Digest,
 * 1980, pp. 407–409. Equation numbers below are as usually quoted from the
 * paper (recalled, not checked against the text). Shared by microstrip,
 * embedded microstrip and coupled microstrip.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import type { ValidityRange } from '../validation';

export const HAMMERSTAD_JENSEN = {
  name: 'Hammerstad–Jensen 1980',
  citation:
    'E. Hammerstad, Ø. Jensen, "Accurate models for microstrip computer-aided design", IEEE MTT-S Int. Microwave Symp. Digest, 1980, pp. 407–409',
};

/** Published ranges: Z01 within 0.03 % for u ≤ 1000, εeff within 0.2 % for 0.01 ≤ u ≤ 100 and εr ≤ 128. */
export const HAMMERSTAD_JENSEN_VALIDITY: readonly ValidityRange[] = [
  { quantity: 'w/h', min: 0.01, max: 100, method: HAMMERSTAD_JENSEN.name },
  { quantity: 'er', min: 1, max: 128, method: HAMMERSTAD_JENSEN.name },
];

/** Coefficient and exponent of f(u) in the air impedance (HJ eq. 2). */
const F_SCALE = 30.666;
const F_EXPONENT = 0.7528;

/**
 * Impedance of a zero-thickness microstrip in air, Z01(u) [Ω], u = w/h.
 * Method: Hammerstad–Jensen 1980, eqs. (1)–(2):
 *   Z01 = η0/(2π)·ln(f(u)/u + √(1 + (2/u)²)),  f(u) = 6 + (2π − 6)·exp(−(30.666/u)^0.7528).
 * Valid:  better than 0.01 % for u ≤ 1 and 0.03 % for u ≤ 1000 (authors' claim).
 */
export function airImpedance(u: number): number {
  const f = 6 + (2 * Math.PI - 6) * Math.exp(-Math.pow(F_SCALE / u, F_EXPONENT));
  return (FREE_SPACE_IMPEDANCE / (2 * Math.PI)) * Math.log(f / u + Math.sqrt(1 + 4 / (u * u)));
}

/**
 * Static effective permittivity of a zero-thickness microstrip.
 * Method: Hammerstad–Jensen 1980, eqs. (3)–(5):
 *   εeff = (εr+1)/2 + (εr−1)/2·(1 + 10/u)^(−a·b),
 *   a = 1 + ln((u⁴ + (u/52)²)/(u⁴ + 0.432))/49 + ln(1 + (u/18.1)³)/18.7,
 *   b = 0.564·((εr − 0.9)/(εr + 3))^0.053.
 * Valid:  better than 0.2 % for εr ≤ 128 and 0.01 ≤ u ≤ 100 (authors' claim).
 */
export function effectivePermittivity(u: number, er: number): number {
  const u4 = u * u * u * u;
  const a = 1 + Math.log((u4 + (u / 52) ** 2) / (u4 + 0.432)) / 49 + Math.log(1 + (u / 18.1) ** 3) / 18.7;
  const b = 0.564 * Math.pow((er - 0.9) / (er + 3), 0.053);
  return (er + 1) / 2 + ((er - 1) / 2) * Math.pow(1 + 10 / u, -a * b);
}

/** Coefficient inside coth²(√(6.517·u)) of the thickness correction (HJ eq. 6). */
const THICKNESS_COTH_COEFFICIENT = 6.517;

/**
 * Microstrip with a strip of finite thickness: static Z0 [Ω], εeff and the air impedance.
 * Method: Hammerstad–Jensen 1980, thickness correction eqs. (6)–(8):
 *   Δu1 = (t/π)·ln(1 + 4e/(t·coth²√(6.517u))),  Δur = ½(1 + 1/cosh√(εr−1))·Δu1   (t = t/h),
 *   Z0 = Z01(u + Δur)/√εeff(u + Δur),  εeff = εeff(u + Δur)·(Z01(u + Δu1)/Z01(u + Δur))².
 * Valid:  as the zero-thickness model, for t/h small (the paper treats t ≪ h).
 */
export function hammerstadJensen(w: number, h: number, t: number, er: number): { z0: number; erEff: number; z0Air: number } {
  const u = w / h;
  let u1 = u;
  let ur = u;
  if (t > 0) {
    const tn = t / h;
    const coth = 1 / Math.tanh(Math.sqrt(THICKNESS_COTH_COEFFICIENT * u));
    const du1 = (tn / Math.PI) * Math.log(1 + (4 * Math.E) / (tn * coth * coth));
    u1 = u + du1;
    ur = u + 0.5 * (1 + 1 / Math.cosh(Math.sqrt(er - 1))) * du1;
  }
  const z01r = airImpedance(ur);
  const erEffR = effectivePermittivity(ur, er);
  const z0Air = airImpedance(u1);
  return { z0: z01r / Math.sqrt(erEffR), erEff: erEffR * (z0Air / z01r) ** 2, z0Air };
}
