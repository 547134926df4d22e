/**
 * What a line on one copper layer sees on each side: the nearest reference
 * plane and the layers between (or, where there is no reference, every layer
 * out to the board's surface), reduced to one height and one Dk and Df.
 */
import type { DielectricLayer, Stackup, StackupLayer } from './stackup';
import { isReference } from './stackup';

/** One slab of dielectric between the strip and a plane (a dielectric layer, or the resin filling a signal layer's etched copper). */
export interface Slab {
  thickness: number;
  relativePermittivity: number;
  lossTangent: number;
  /** Index of the layer it stands for. */
  layerIndex: number;
}

export interface StackupSide {
  /** Index of the reference plane, or undefined when the layers run out to the surface. */
  referenceIndex?: number;
  /** From the strip outwards. */
  slabs: Slab[];
  /** Σ thickness [m]. */
  height: number;
  /** Names of signal layers lying between the strip and the reference. */
  crossedSignalLayers: string[];
}

/** The side of layer `layerIndex` in direction −1 (up, towards layers[0]) or +1 (down). */
export function stackupSide(stackup: Stackup, layerIndex: number, direction: -1 | 1): StackupSide {
  const { layers } = stackup;
  const slabs: Slab[] = [];
  const crossedSignalLayers: string[] = [];
  for (let index = layerIndex + direction; index >= 0 && index < layers.length; index += direction) {
    const layer = layers[index];
    if (isReference(layer)) return side(slabs, crossedSignalLayers, index);
    if (layer.type === 'dielectric') {
      slabs.push({ thickness: layer.thickness, relativePermittivity: layer.relativePermittivity, lossTangent: layer.lossTangent, layerIndex: index });
      continue;
    }
    // A signal layer in the way: its copper is mostly etched away and the pressed resin fills the space.
    const fill = fillingDielectric(layers, index, direction);
    slabs.push({ thickness: layer.thickness, relativePermittivity: fill.relativePermittivity, lossTangent: fill.lossTangent, layerIndex: index });
    crossedSignalLayers.push(layer.name);
  }
  return side(slabs, crossedSignalLayers, undefined);
}

function side(slabs: Slab[], crossedSignalLayers: string[], referenceIndex: number | undefined): StackupSide {
  return { referenceIndex, slabs, height: slabs.reduce((sum, slab) => sum + slab.thickness, 0), crossedSignalLayers };
}

/**
 * The dielectric taken to fill an etched copper layer: the prepreg beside it
 * (prepreg is what flows into the etched gaps in the press), else the
 * dielectric on the strip's side of it (common practice, no source).
 */
function fillingDielectric(layers: StackupLayer[], index: number, direction: -1 | 1): DielectricLayer {
  const towardsStrip = layers[index - direction] as DielectricLayer;
  const beyond = layers[index + direction];
  if (towardsStrip.kind !== 'prepreg' && beyond?.type === 'dielectric' && beyond.kind === 'prepreg') return beyond;
  return towardsStrip;
}

/**
 * One Dk and Df for slabs stacked between a strip and its plane.
 * Method: slabs in series, as plane capacitors with the same flux density D
 *   through each: 1/C ∝ Σ hᵢ/εᵢ, so ε = Σhᵢ / Σ(hᵢ/εᵢ) (thickness-weighted harmonic mean);
 *   the stored energy of slab i ∝ hᵢ/εᵢ, so tanδ = Σ(hᵢ·tanδᵢ/εᵢ) / Σ(hᵢ/εᵢ).
 * Valid:  exact for a strip much wider than the slabs' height (uniform field); for
 *   narrower strips the fringing field spreads sideways and the result is an estimate.
 */
export function seriesDielectric(slabs: readonly Slab[]): { relativePermittivity: number; lossTangent: number } {
  const height = slabs.reduce((sum, slab) => sum + slab.thickness, 0);
  const elastance = slabs.reduce((sum, slab) => sum + slab.thickness / slab.relativePermittivity, 0);
  const loss = slabs.reduce((sum, slab) => sum + (slab.thickness * slab.lossTangent) / slab.relativePermittivity, 0);
  return { relativePermittivity: height / elastance, lossTangent: loss / elastance };
}

/**
 * One Dk and Df for a strip between two planes whose sides have different Dk.
 * Method: the two sides' plane capacitances in parallel (the same voltage across
 *   each): C ∝ ε₁/h₁ + ε₂/h₂, so ε = (ε₁/h₁ + ε₂/h₂)/(1/h₁ + 1/h₂); the energy of
 *   side i ∝ εᵢ/hᵢ, so tanδ = Σ(εᵢ·tanδᵢ/hᵢ)/Σ(εᵢ/hᵢ).
 * Valid:  as seriesDielectric: exact for a wide strip, an estimate otherwise.
 */
export function parallelDielectric(
  sides: readonly { height: number; relativePermittivity: number; lossTangent: number }[],
): { relativePermittivity: number; lossTangent: number } {
  const capacitance = sides.reduce((sum, entry) => sum + entry.relativePermittivity / entry.height, 0);
  const inverseHeights = sides.reduce((sum, entry) => sum + 1 / entry.height, 0);
  const loss = sides.reduce((sum, entry) => sum + (entry.relativePermittivity * entry.lossTangent) / entry.height, 0);
  return { relativePermittivity: capacitance / inverseHeights, lossTangent: loss / capacitance };
}

/** The distinct Dk values of some slabs, for the mixed-dielectric warning. */
export function distinctPermittivities(slabs: readonly Slab[]): number[] {
  const values: number[] = [];
  for (const slab of slabs) if (!values.some((value) => Math.abs(value - slab.relativePermittivity) <= 1e-9 * value)) values.push(slab.relativePermittivity);
  return values;
}
