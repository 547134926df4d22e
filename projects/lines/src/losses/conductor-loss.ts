/**
 * Conductor attenuation of any line kind from the kind's own Z0 formula.
 */
import { FREE_SPACE_IMPEDANCE } from '../constants';
import type { LineModel, ModelOutput } from '../kinds/line-model';
import type { LineSpec } from '../types';

/** Wall recession for the numerical derivative, relative to the smallest conductor dimension. */
const RELATIVE_RECESSION = 1e-6;

export interface ConductorAttenuation {
  /** The (odd-mode, for coupled kinds) attenuation [Np/m]. */
  main: number;
  /** Even-mode attenuation for coupled kinds [Np/m]. */
  even?: number;
}

/**
 * Conductor attenuation αc [Np/m] for a surface resistance Rs (roughness included).
 * Method: Wheeler's incremental-inductance rule (H. A. Wheeler, "Formulas for the skin
 *   effect", Proc. IRE 30, 1942, pp. 412–424): R' = (Rs/η0)·∂Z0air/∂n, αc = R'/(2Z0),
 *   where ∂n moves every conductor surface into its metal; ∂Z0air/∂n by a forward difference
 *   on the kind's own air-filled Z0 formula (model.recede).
 * Valid:  conductors several skin depths thick; as accurate as the kind's Z0 formula's
 *   dependence on the dimensions (exact for coax and wires).
 */
export function conductorAttenuation<S extends LineSpec>(
  model: LineModel<S>,
  spec: S,
  line: ModelOutput,
  surfaceResistanceValue: number,
  scale: number,
): ConductorAttenuation {
  const recession = RELATIVE_RECESSION * scale;
  const air = airModes(model, spec);
  const receded = airModes(model, model.recede(spec, recession));
  const factor = surfaceResistanceValue / (2 * FREE_SPACE_IMPEDANCE * recession);
  if (!model.isCoupled) return { main: (factor * (receded.z0 - air.z0)) / line.z0 };
  return {
    main: (factor * (receded.zOdd! - air.zOdd!)) / line.zOdd!,
    even: (factor * (receded.zEven! - air.zEven!)) / line.zEven!,
  };
}

/** The kind's impedances with every dielectric replaced by air, quasi-static. */
function airModes<S extends LineSpec>(model: LineModel<S>, spec: S): ModelOutput {
  const air = { ...spec, er: 1, frequency: undefined };
  // A cover is part of the dielectric, so it becomes air too.
  if ('cover' in air) (air as { erCover?: number }).erCover = 1;
  return model.compute(air);
}
