/**
 * The few complex operations the frequency-domain solution needs, on plain
 * { re, im } records (the shape of ComplexValue). Written out rather than
 * taken from complex.js so the inner loop over thousands of frequencies stays
 * free of its dispatch; principal branches throughout.
 */
import type { ComplexValue } from '../types';

export type Complex = ComplexValue;

export const complex = (re: number, im = 0): Complex => ({ re, im });

export const add = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });

export const subtract = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });

export const scale = (a: Complex, k: number): Complex => ({ re: a.re * k, im: a.im * k });

export const multiply = (a: Complex, b: Complex): Complex => ({
  re: a.re * b.re - a.im * b.im,
  im: a.re * b.im + a.im * b.re,
});

/** a / b by Smith's algorithm, which avoids overflow in |b|² (Smith, CACM 5, 1962, p. 435). */
export function divide(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/** Principal square root (branch cut on the negative real axis), cancellation-free form. */
export function sqrt(a: Complex): Complex {
  const m = Math.hypot(a.re, a.im);
  if (m === 0) return { re: 0, im: 0 };
  if (a.re >= 0) {
    const t = Math.sqrt((m + a.re) / 2);
    return { re: t, im: a.im / (2 * t) };
  }
  const t = Math.sqrt((m - a.re) / 2);
  return { re: Math.abs(a.im) / (2 * t), im: Math.sign(a.im || 1) * t };
}

export function exp(a: Complex): Complex {
  const m = Math.exp(a.re);
  return { re: m * Math.cos(a.im), im: m * Math.sin(a.im) };
}

/** Principal logarithm. */
export const log = (a: Complex): Complex => ({ re: Math.log(Math.hypot(a.re, a.im)), im: Math.atan2(a.im, a.re) });
