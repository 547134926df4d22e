/**
 * Frequency dispersion of microstrip: εeff(f) by Kirschning–Jansen 1982 and
 * Z0(f) by Jansen–Kirschning 1983. Coefficients recalled from the papers as
 * they are widely quoted (not checked against the original text); the tests
 * check the limits the papers guarantee (f → 0 gives the static values,
 * εeff(f) rises monotonically towards εr).
 */
import type { ValidityRange } from '../validation';

export const KIRSCHNING_JANSEN_DISPERSION = {
  name: 'Kirschning–Jansen 1982 εeff(f), Jansen–Kirschning 1983 Z0(f)',
  citation:
    'M. Kirschning, R. H. Jansen, Electronics Letters 18(6), 1982, pp. 272–273; R. H. Jansen, M. Kirschning, AEÜ 37, 1983, pp. 108–112',
};

/** εeff(f): 0.6 % up to 60 GHz for 0.1 ≤ w/h ≤ 100, 1 ≤ εr ≤ 20, h/λ0 ≤ 0.13 (authors' claim). */
export const DISPERSION_VALIDITY: readonly ValidityRange[] = [
  { quantity: 'w/h', min: 0.1, max: 100, method: KIRSCHNING_JANSEN_DISPERSION.name },
  { quantity: 'er', min: 1, max: 20, method: KIRSCHNING_JANSEN_DISPERSION.name },
  { quantity: 'h/λ0', min: 0, max: 0.13, method: KIRSCHNING_JANSEN_DISPERSION.name },
];

/** The papers' normalised frequency fn = f·h in GHz·mm. */
export function normalisedFrequency(frequency: number, h: number): number {
  return frequency * 1e-9 * h * 1e3;
}

/**
 * Effective permittivity at frequency.
 * Method: Kirschning–Jansen 1982: εeff(f) = εr − (εr − εeff(0))/(1 + P(f)),
 *   P = P1·P2·((0.1844 + P3·P4)·fn)^1.5763 with P1…P4 of the paper; u = w/h, fn = f·h [GHz·mm].
 * Valid:  see DISPERSION_VALIDITY; 0.6 % claimed.
 */
export function dispersiveErEff(u: number, er: number, erEff0: number, fn: number): number {
  const p1 = 0.27488 + (0.6315 + 0.525 / Math.pow(1 + 0.0157 * fn, 20)) * u - 0.065683 * Math.exp(-8.7513 * u);
  const p2 = 0.33622 * (1 - Math.exp(-0.03442 * er));
  const p3 = 0.0363 * Math.exp(-4.6 * u) * (1 - Math.exp(-Math.pow(fn / 38.7, 4.97)));
  const p4 = 1 + 2.751 * (1 - Math.exp(-Math.pow(er / 15.916, 8)));
  const p = p1 * p2 * Math.pow((0.1844 + p3 * p4) * fn, 1.5763);
  return er - (er - erEff0) / (1 + p);
}

/**
 * Characteristic impedance at frequency [Ω].
 * Method: Jansen–Kirschning 1983: Z0(f) = Z0(0)·(R13/R14)^R17 with R1…R17 of the paper.
 * Valid:  0.1 ≤ u ≤ 100, 1 ≤ εr ≤ 20, fn ≤ 25 GHz·mm; about 1 % claimed (recalled).
 */
export function dispersiveImpedance(u: number, er: number, erEff0: number, erEffF: number, z00: number, fn: number): number {
  const r1 = 0.03891 * Math.pow(er, 1.4);
  const r2 = 0.267 * Math.pow(u, 7);
  const r3 = 4.766 * Math.exp(-3.228 * Math.pow(u, 0.641));
  const r4 = 0.016 + Math.pow(0.0514 * er, 4.524);
  const r5 = Math.pow(fn / 28.843, 12);
  const r6 = 22.2 * Math.pow(u, 1.92);
  const r7 = 1.206 - 0.3144 * Math.exp(-r1) * (1 - Math.exp(-r2));
  const r8 = 1 + 1.275 * (1 - Math.exp(-0.004625 * r3 * Math.pow(er, 1.674) * Math.pow(fn / 18.365, 2.745)));
  const erMinusOne6 = Math.pow(er - 1, 6);
  const r9 = ((5.086 * r4 * r5) / (0.3838 + 0.386 * r4)) * (Math.exp(-r6) / (1 + 1.2992 * r5)) * (erMinusOne6 / (1 + 10 * erMinusOne6));
  const r10 = 0.00044 * Math.pow(er, 2.136) + 0.0184;
  const f6 = Math.pow(fn / 19.47, 6);
  const r11 = f6 / (1 + 0.0962 * f6);
  const r12 = 1 / (1 + 0.00245 * u * u);
  const r13 = 0.9408 * Math.pow(erEffF, r8) - 0.9603;
  const r14 = (0.9408 - r9) * Math.pow(erEff0, r8) - 0.9603;
  const r15 = 0.707 * r10 * Math.pow(fn / 12.3, 1.097);
  const r16 = 1 + 0.0503 * er * er * r11 * (1 - Math.exp(-Math.pow(u / 15, 6)));
  const r17 = r7 * (1 - 1.1241 * (r12 / r16) * Math.exp(-0.026 * Math.pow(fn, 1.15656) - r15));
  return z00 * Math.pow(r13 / r14, r17);
}
