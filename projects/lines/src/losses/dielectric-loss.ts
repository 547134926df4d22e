/**
 * Dielectric attenuation of a quasi-TEM line.
 */
import { SPEED_OF_LIGHT } from '../constants';

/**
 * Dielectric attenuation αd [Np/m] with the filling factor q = (εeff − 1)/(εr − 1):
 * αd = k0·εr·q·tanδ/(2√εeff), k0 = 2πf/c0; q = 1 for a homogeneous line (αd = k0√εr·tanδ/2).
 * Method: Pozar, Microwave Engineering, 4th ed., §3.8 (microstrip; equation number not checked), the filling-factor form.
 * Valid:  low loss (tanδ ≪ 1); one dielectric, or a cover of the same loss tangent.
 */
export function dielectricAttenuation(frequency: number, er: number, erEff: number, tanDelta: number): number {
  const k0 = (2 * Math.PI * frequency) / SPEED_OF_LIGHT;
  // q is clamped to [0, 1]: a cover of higher permittivity than the substrate can push εeff above εr.
  const fillingFactor = er > 1 ? Math.min(1, Math.max(0, (erEff - 1) / (er - 1))) : 1;
  return (k0 * er * fillingFactor * tanDelta) / (2 * Math.sqrt(erEff));
}
