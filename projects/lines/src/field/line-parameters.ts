/**
 * Line parameters from the Maxwell capacitance matrices with (C) and without
 * (C0) the dielectrics, quasi-static TEM: L = μ0·ε0·C0⁻¹, and for one signal
 * conductor Z0 = 1/(c0·√(C·C0)), εeff = C/C0 (e.g. Pozar, Microwave
 * Engineering, 4th ed., §3.8). For a pair, the odd and even modes are the
 * (1, −1) and (1, 1) excitations: C_odd = C11 − C12, C_even = C11 + C12 with
 * the Maxwell (negative) C12; zDiff = 2·zOdd, zCommon = zEven/2.
 */
import { SPEED_OF_LIGHT, VACUUM_PERMEABILITY, VACUUM_PERMITTIVITY } from '../constants';

export interface LineParameters {
  /** Single conductor: its Z0. Pair: √(zOdd·zEven), the image impedance of a coupled-line section, as calculate() reports it [Ω]. */
  z0: number;
  /** Single conductor: C/C0. Pair: the odd mode's, as calculate() reports it. */
  erEff: number;
  zOdd?: number;
  zEven?: number;
  zDiff?: number;
  zCommon?: number;
  erEffOdd?: number;
  erEffEven?: number;
  /** Maxwell capacitance matrix [F/m]. */
  capacitance: number[][];
  /** The same with every dielectric removed [F/m]. */
  vacuumCapacitance: number[][];
  /** Inductance matrix L = μ0ε0·C0⁻¹ [H/m]. */
  inductance: number[][];
}

/** Impedance of a mode with capacitance c (dielectrics) and c0 (vacuum) per unit length. */
function modeImpedance(c: number, c0: number): number {
  return 1 / (SPEED_OF_LIGHT * Math.sqrt(c * c0));
}

/** Parameters of one or two signal conductors (more give matrices only, z0 of the first conductor alone). */
export function lineParameters(capacitance: number[][], vacuumCapacitance: number[][]): LineParameters {
  const inductance = invert(vacuumCapacitance).map((row) => row.map((value) => value * VACUUM_PERMEABILITY * VACUUM_PERMITTIVITY));
  const c = capacitance[0]![0]!;
  const c0 = vacuumCapacitance[0]![0]!;
  const single = { z0: modeImpedance(c, c0), erEff: c / c0, capacitance, vacuumCapacitance, inductance };
  if (capacitance.length !== 2) return single;
  const self = (capacitance[0]![0]! + capacitance[1]![1]!) / 2;
  const selfVacuum = (vacuumCapacitance[0]![0]! + vacuumCapacitance[1]![1]!) / 2;
  const mutual = capacitance[0]![1]!;
  const mutualVacuum = vacuumCapacitance[0]![1]!;
  const odd = self - mutual;
  const oddVacuum = selfVacuum - mutualVacuum;
  const even = self + mutual;
  const evenVacuum = selfVacuum + mutualVacuum;
  const zOdd = modeImpedance(odd, oddVacuum);
  const zEven = modeImpedance(even, evenVacuum);
  return {
    ...single,
    z0: Math.sqrt(zOdd * zEven),
    erEff: odd / oddVacuum,
    zOdd,
    zEven,
    zDiff: 2 * zOdd,
    zCommon: zEven / 2,
    erEffOdd: odd / oddVacuum,
    erEffEven: even / evenVacuum,
  };
}

/** Inverse of a small symmetric positive-definite matrix by Gauss–Jordan elimination. */
function invert(matrix: number[][]): number[][] {
  const n = matrix.length;
  const a = matrix.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let col = 0; col < n; col++) {
    const pivot = a[col]![col]!;
    for (let j = 0; j < 2 * n; j++) a[col]![j]! /= pivot;
    for (let row = 0; row < n; row++) {
      if (row === col) continue;
      const factor = a[row]![col]!;
      for (let j = 0; j < 2 * n; j++) a[row]![j]! -= factor * a[col]![j]!;
    }
  }
  return a.map((row) => row.slice(n));
}
