/**
 * Exact quasi-static TEM results the field solver is checked against, written
 * here from the papers' formulas (independently of the library's own kinds/ and
 * math/ code), with the complete elliptic integral by the arithmetic–geometric
 * mean. exact-references.spec.ts cross-checks that integral against the
 * `ellipk` routine of the stdlib-js project (npm @stdlib/math-base-special-ellipk).
 */

/** η0 = μ0·c0 with μ0 from CODATA 2018 and c0 exact (SI 2019) [Ω]. */
export const ETA0 = 1.25663706212e-6 * 299_792_458;

/** Arithmetic–geometric mean; quadratic convergence, 40 rounds is a hard stop never reached. */
function agm(a0: number, b0: number): number {
  let a = a0;
  let b = b0;
  for (let round = 0; round < 40 && Math.abs(a - b) > 4e-16 * a; round++) [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
  return a;
}

/** K(k) for modulus k: π / (2·AGM(1, √(1 − k²))) (Abramowitz & Stegun 1964, eq. 17.6.1). */
export function ellipticKByAgm(k: number): number {
  return Math.PI / (2 * agm(1, Math.sqrt((1 - k) * (1 + k))));
}

/** K(k′)/K(k) = AGM(1, k′)/AGM(1, k), from k and k′ given separately so neither loses precision near 0 or 1. */
function ratioPrimeOverK(k: number, kPrime = Math.sqrt((1 - k) * (1 + k))): number {
  return agm(1, kPrime) / agm(1, k);
}

/**
 * Zero-thickness centred stripline, plane spacing b: Z0 = η0/(4√εr)·K(k′)/K(k), k = tanh(πw/2b)
 * (S. B. Cohn, IRE Trans. MTT-2, July 1954, pp. 52–57; the tanh form of the sech result).
 */
export function cohnStripline(w: number, b: number, er: number): number {
  const x = (Math.PI * w) / (2 * b);
  return (ETA0 / (4 * Math.sqrt(er))) * ratioPrimeOverK(Math.tanh(x), 1 / Math.cosh(x));
}

/**
 * Zero-thickness edge-coupled stripline, edge gap s: Z0e,o = η0/(4√εr)·K(k′)/K(k),
 * k_e = tanh(πw/2b)·tanh(π(w+s)/2b), k_o = tanh(πw/2b)·coth(π(w+s)/2b)
 * (S. B. Cohn, IRE Trans. MTT-3, Oct. 1955, pp. 29–38).
 */
export function cohnCoupledStripline(w: number, s: number, b: number, er: number): { zEven: number; zOdd: number } {
  const a = Math.tanh((Math.PI * w) / (2 * b));
  const c = Math.tanh((Math.PI * (w + s)) / (2 * b));
  const scale = ETA0 / (4 * Math.sqrt(er));
  return { zEven: scale * ratioPrimeOverK(a * c), zOdd: scale * ratioPrimeOverK(a / c) };
}

/** Coax: Z0 = η0/(2π√εr)·ln(D/d) (Pozar, Microwave Engineering, 4th ed., §2.2 / §3.4). */
export function coaxExact(d: number, D: number, er: number): number {
  return (ETA0 / (2 * Math.PI * Math.sqrt(er))) * Math.log(D / d);
}

/** Two round wires, centre spacing s: Z0 = η0/(π√εr)·acosh(s/d) (exact TEM, image method; e.g. Pozar 4th ed., Table 2.1). */
export function twinLeadExact(d: number, s: number, er: number): number {
  return (ETA0 / (Math.PI * Math.sqrt(er))) * Math.acosh(s / d);
}

/** Wire over a ground plane, centre height h: Z0 = η0/(2π√εr)·acosh(2h/d) (half the two-wire line by images). */
export function wireOverGroundExact(d: number, h: number, er: number): number {
  return (ETA0 / (2 * Math.PI * Math.sqrt(er))) * Math.acosh((2 * h) / d);
}
