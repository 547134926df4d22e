/**
 * Skin effect in a good conductor (non-magnetic, μr = 1).
 */
import { VACUUM_PERMEABILITY } from '../constants';

/**
 * Skin depth δ [m].
 * Method: δ = 1/√(π f μ0 σ) (standard result; e.g. Pozar, Microwave Engineering, 4th ed., ch. 1).
 * Valid:  good conductors (σ ≫ ωε), non-magnetic metal.
 */
export function skinDepth(frequency: number, conductivity: number): number {
  return 1 / Math.sqrt(Math.PI * frequency * VACUUM_PERMEABILITY * conductivity);
}

/**
 * Surface resistance of a smooth conductor Rs = 1/(σδ) = √(π f μ0/σ) [Ω per square].
 * Method: standard result (e.g. Pozar, Microwave Engineering, 4th ed., ch. 1).
 * Valid:  conductor thicker than a few skin depths.
 */
export function surfaceResistance(frequency: number, conductivity: number): number {
  return Math.sqrt((Math.PI * frequency * VACUUM_PERMEABILITY) / conductivity);
}
