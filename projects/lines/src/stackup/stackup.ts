/**
 * A printed-circuit stackup: the ordered layers of a board, top to bottom.
 * Copper layers carry signals or serve as reference planes; dielectric layers
 * (cores, prepregs, and coatings such as solder mask on the outside) separate them.
 * SI throughout: thicknesses in metres.
 */
import { LineInputError } from '../errors';
import { requireAtLeast, requireNonNegative, requirePositive } from '../validation';

export type CopperRole = 'signal' | 'plane' | 'mixed';
export type DielectricKind = 'core' | 'prepreg' | 'coating';

export interface CopperLayer {
  type: 'copper';
  /** Label shown in tables, e.g. 'L1 Top'. */
  name: string;
  /** Foil thickness (plated, for outer layers) [m]. */
  thickness: number;
  /**
   * 'signal' carries lines; 'plane' is a solid reference; 'mixed' carries lines and a
   * pour, and is taken as a reference for the layers beside it (poured under their lines).
   */
  role: CopperRole;
}

export interface DielectricLayer {
  type: 'dielectric';
  name: string;
  /** Pressed thickness [m]. */
  thickness: number;
  /** Dk at the material's reference frequency. */
  relativePermittivity: number;
  /** Df. */
  lossTangent: number;
  kind: DielectricKind;
  /** Catalog material name, for labels only. */
  material?: string;
}

export type StackupLayer = CopperLayer | DielectricLayer;

export interface Stackup {
  /** Top to bottom. */
  layers: StackupLayer[];
}

/** Layers that can serve as a reference for a line on another layer. */
export function isReference(layer: StackupLayer): boolean {
  return layer.type === 'copper' && (layer.role === 'plane' || layer.role === 'mixed');
}

/** Indices (into `layers`) of the copper layers, top to bottom. */
export function copperIndices(stackup: Stackup): number[] {
  return stackup.layers.flatMap((layer, index) => (layer.type === 'copper' ? [index] : []));
}

/** Total board thickness, coatings included [m]. */
export function stackupThickness(stackup: Stackup): number {
  return stackup.layers.reduce((sum, layer) => sum + layer.thickness, 0);
}

/**
 * Throws LineInputError naming `layers[i].field` unless the stackup can be built:
 * at least two copper layers; no two copper layers touching; every thickness > 0,
 * Dk ≥ 1, Df ≥ 0; only coatings outside the outermost copper, and coatings nowhere else.
 */
export function validateStackup(stackup: Stackup): void {
  if (!Array.isArray(stackup?.layers)) throw new LineInputError('layers', 'must be a list of layers, top to bottom');
  const copper = copperIndices(stackup);
  if (copper.length < 2) throw new LineInputError('layers', 'needs at least two copper layers');
  const [first, last] = [copper[0], copper[copper.length - 1]];
  stackup.layers.forEach((layer, index) => {
    const field = `layers[${index}]`;
    requirePositive(`${field}.thickness`, layer.thickness);
    if (layer.type === 'copper') {
      if (!['signal', 'plane', 'mixed'].includes(layer.role)) throw new LineInputError(`${field}.role`, 'must be signal, plane or mixed');
      if (stackup.layers[index + 1]?.type === 'copper') throw new LineInputError(`layers[${index + 1}]`, 'two copper layers cannot touch: put a dielectric between them');
      return;
    }
    if (layer.type !== 'dielectric') throw new LineInputError(`${field}.type`, 'must be copper or dielectric');
    requireAtLeast(`${field}.relativePermittivity`, layer.relativePermittivity, 1);
    requireNonNegative(`${field}.lossTangent`, layer.lossTangent);
    if (!['core', 'prepreg', 'coating'].includes(layer.kind)) throw new LineInputError(`${field}.kind`, 'must be core, prepreg or coating');
    const isOutside = index < first || index > last;
    if (isOutside && layer.kind !== 'coating') throw new LineInputError(`${field}.kind`, 'only a coating can lie outside the outer copper layers');
    if (!isOutside && layer.kind === 'coating') throw new LineInputError(`${field}.kind`, 'a coating can lie only outside the outer copper layers');
  });
}
