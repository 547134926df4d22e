/**
 * The little complex arithmetic the library needs (Zc = √((R + jωL)/(G + jωC))),
 * kept allocation-light for the live calculator.
 */
import type { ComplexValue } from '../types';

/** (a + jb)/(c + jd). */
export function complexDivide(a: number, b: number, c: number, d: number): ComplexValue {
  const denominator = c * c + d * d;
  return { re: (a * c + b * d) / denominator, im: (b * c - a * d) / denominator };
}

/** Principal square root (re ≥ 0), computed without cancellation for either sign of re. */
export function complexSqrt(z: ComplexValue): ComplexValue {
  const modulus = Math.hypot(z.re, z.im);
  if (modulus === 0) return { re: 0, im: 0 };
  if (z.re >= 0) {
    const re = Math.sqrt((modulus + z.re) / 2);
    return { re, im: z.im / (2 * re) };
  }
  const im = Math.sign(z.im || 1) * Math.sqrt((modulus - z.re) / 2);
  return { re: z.im / (2 * im), im };
}
