/**
 * Exact TEM solutions for round conductors in a homogeneous dielectric.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';

export const EXACT_TEM = {
  name: 'Exact TEM solution',
  citation: 'Closed-form electrostatics of round conductors; e.g. D. M. Pozar, Microwave Engineering, 4th ed., Wiley, 2012, ch. 2–3',
};

/**
 * Coaxial line impedance [Ω].
 * Method: exact TEM result, Z0 = η0/(2π√εr)·ln(D/d).
 * Valid:  D > d > 0, concentric, homogeneous non-magnetic dielectric, below the TE11 cut-off.
 */
export function coaxImpedance(d: number, D: number, er: number): number {
  return (FREE_SPACE_IMPEDANCE / (2 * Math.PI * Math.sqrt(er))) * Math.log(D / d);
}

/**
 * Two parallel round wires (twin lead) impedance [Ω].
 * Method: exact TEM result, Z0 = η0/(π√εr)·acosh(s/d).
 * Valid:  s > d > 0; homogeneous dielectric filling all space (for real twin lead εr is an effective value).
 */
export function twinLeadImpedance(d: number, s: number, er: number): number {
  return (FREE_SPACE_IMPEDANCE / (Math.PI * Math.sqrt(er))) * Math.acosh(s / d);
}

/**
 * Round wire over an infinite ground plane impedance [Ω].
 * Method: exact TEM result by images, Z0 = η0/(2π√εr)·acosh(2h/d).
 * Valid:  2h > d > 0 (h measured to the wire's centre); homogeneous dielectric.
 */
export function wireOverGroundImpedance(d: number, h: number, er: number): number {
  return (FREE_SPACE_IMPEDANCE / (2 * Math.PI * Math.sqrt(er))) * Math.acosh((2 * h) / d);
}
