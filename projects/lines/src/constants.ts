/**
 * Physical constants, SI units. Sources: c0 exact by the 2019 SI definition;
 * μ0 and ε0 from CODATA 2018 (NIST); copper from the International Annealed
 * Copper Standard (100 % IACS).
 */

/** Speed of light in vacuum [m/s], exact (SI 2019). */
export const SPEED_OF_LIGHT = 299_792_458;

/** Vacuum permeability μ0 [H/m], CODATA 2018. */
export const VACUUM_PERMEABILITY = 1.25663706212e-6;

/** Vacuum permittivity ε0 [F/m], CODATA 2018. */
export const VACUUM_PERMITTIVITY = 8.8541878128e-12;

/** Impedance of free space η0 = μ0·c0 [Ω] (≈ 376.730 313). */
export const FREE_SPACE_IMPEDANCE = VACUUM_PERMEABILITY * SPEED_OF_LIGHT;

/** Annealed copper conductivity [S/m], 100 % IACS; the default `conductivity`. */
export const COPPER_CONDUCTIVITY = 5.8001e7;

/** Nepers to decibels: 20·log10(e). */
export const DB_PER_NEPER = 20 / Math.LN10;
