/**
 * From a stackup and a copper layer to the LineSpec the formulas compute:
 * a layer with a reference plane on one side is a microstrip (embedded under
 * whatever lies on its other side, e.g. solder mask); a layer between two
 * references is a stripline, offset when the two heights differ.
 */
import { LineInputError } from '../errors';
import type { LineSpec } from '../types';
import { requirePositive } from '../validation';
import { copperIndices, type CopperLayer, type Stackup, validateStackup } from './stackup';
import { distinctPermittivities, parallelDielectric, seriesDielectric, type StackupSide, stackupSide } from './stackup-sides';

export type LineStructure = 'single' | 'pair';

export interface LineDimensions {
  /** Strip width [m]. */
  width: number;
  /** Edge-to-edge gap of a pair [m]. */
  gap?: number;
}

/** Operating and conductor inputs passed through to the spec. */
export interface LineUse {
  frequency?: number;
  length?: number;
  conductivity?: number;
  roughness?: number;
}

export interface StackupLineGeometry {
  layerIndex: number;
  structure: LineStructure;
  /** 'outer' for the top and bottom copper layers. */
  position: 'outer' | 'inner';
  /** Reference planes, the one above first (layer indices). */
  referenceIndices: number[];
  /** Dielectric height from the strip to each reference, in the same order [m]. */
  referenceHeights: number[];
  /** Dielectric height to the reference above / below, or to the surface where there is none [m]. */
  heightAbove: number;
  heightBelow: number;
  /** True when layers of different Dk had to be blended into one (see the warning). */
  isMixedDielectric: boolean;
  spec: LineSpec;
  warnings: string[];
}

/** Heights closer than this (relative) count as a centred stripline. */
const CENTRED_TOLERANCE = 1e-6;

/**
 * The line spec for `structure` on copper layer `layerIndex` (an index into
 * stackup.layers) with the given width (and gap for a pair).
 * Throws LineInputError('layerIndex') for a layer that is not copper, is a solid
 * plane, or has no reference plane on either side.
 */
export function lineGeometryFor(stackup: Stackup, layerIndex: number, structure: LineStructure, dimensions: LineDimensions, use: LineUse = {}): StackupLineGeometry {
  validateStackup(stackup);
  const layer = stackup.layers[layerIndex];
  if (!Number.isInteger(layerIndex) || !layer || layer.type !== 'copper') throw new LineInputError('layerIndex', 'must be the index of a copper layer');
  if (layer.role === 'plane') throw new LineInputError('layerIndex', `${layer.name} is a plane; lines go on signal or mixed layers`);
  if (structure !== 'single' && structure !== 'pair') throw new LineInputError('structure', 'must be single or pair');
  requirePositive('width', dimensions.width);
  if (structure === 'pair') requirePositive('gap', dimensions.gap);

  const above = stackupSide(stackup, layerIndex, -1);
  const below = stackupSide(stackup, layerIndex, 1);
  const referenced = [above, below].filter((side) => side.referenceIndex !== undefined);
  if (referenced.length === 0) throw new LineInputError('layerIndex', `${layer.name} has no plane or mixed layer on either side to reference`);

  const warnings = crossingWarnings(stackup, layer, [above, below]);
  const given = Object.fromEntries(Object.entries(use).filter(([, value]) => value !== undefined)) as LineUse;
  const base = { w: dimensions.width, t: layer.thickness, ...given, ...(structure === 'pair' ? { s: dimensions.gap! } : {}) };
  const mixing = { isMixed: false };
  const spec =
    referenced.length === 2
      ? buriedSpec(base, structure, above, below, warnings, mixing, layer.name)
      : surfaceSpec(base, structure, referenced[0], referenced[0] === above ? below : above, warnings, mixing, layer.name);
  const copper = copperIndices(stackup);
  return {
    layerIndex,
    structure,
    position: layerIndex === copper[0] || layerIndex === copper[copper.length - 1] ? 'outer' : 'inner',
    referenceIndices: referenced.map((side) => side.referenceIndex!),
    referenceHeights: referenced.map((side) => side.height),
    heightAbove: above.height,
    heightBelow: below.height,
    isMixedDielectric: mixing.isMixed,
    spec,
    warnings,
  };
}

type BaseFields = { w: number; t: number; s?: number } & LineUse;

/** One plane: the substrate is the referenced side; anything on the other side is a cover. */
function surfaceSpec(base: BaseFields, structure: LineStructure, substrate: StackupSide, other: StackupSide, warnings: string[], mixing: { isMixed: boolean }, name: string): LineSpec {
  const dielectric = blendedSide(substrate, warnings, mixing, `between ${name} and its plane`);
  const common = { ...base, h: substrate.height, er: dielectric.relativePermittivity, tanDelta: dielectric.lossTangent };
  if (other.slabs.length === 0) return { kind: structure === 'pair' ? 'coupled-microstrip' : 'microstrip', ...common } as LineSpec;
  if (structure === 'pair') {
    warnings.push(
      `the coupled-microstrip formula has no cover: the ${formatMicrometres(other.height)} over ${name} is left out (it lowers the impedance by a few per cent); check the pair with the field solver`,
    );
    return { kind: 'coupled-microstrip', ...common } as LineSpec;
  }
  const cover = blendedSide(other, warnings, mixing, `over ${name}`);
  return { kind: 'embedded-microstrip', ...common, cover: other.height, erCover: cover.relativePermittivity } as LineSpec;
}

/** Two planes: stripline (centred) or offset stripline; a pair is computed as centred. */
function buriedSpec(base: BaseFields, structure: LineStructure, above: StackupSide, below: StackupSide, warnings: string[], mixing: { isMixed: boolean }, name: string): LineSpec {
  const upper = blendedSide(above, warnings, mixing, `between ${name} and the plane above`);
  const lower = blendedSide(below, warnings, mixing, `between ${name} and the plane below`);
  const isSameDk = Math.abs(upper.relativePermittivity - lower.relativePermittivity) <= 1e-9 * lower.relativePermittivity;
  const dielectric = parallelDielectric([{ height: above.height, ...upper }, { height: below.height, ...lower }]);
  if (!isSameDk) {
    mixing.isMixed = true;
    warnings.push(
      `the dielectric above ${name} (Dk ${format(upper.relativePermittivity)}) differs from the one below (Dk ${format(lower.relativePermittivity)}): the formula uses one blended Dk of ${format(dielectric.relativePermittivity)}; the field solver takes the layers as they are`,
    );
  }
  const common = { ...base, er: dielectric.relativePermittivity, tanDelta: dielectric.lossTangent };
  const isCentred = Math.abs(above.height - below.height) <= CENTRED_TOLERANCE * (above.height + below.height);
  const b = above.height + base.t + below.height;
  if (structure === 'pair') {
    if (!isCentred) {
      warnings.push(
        `the pair on ${name} sits off-centre (${formatMicrometres(above.height)} above, ${formatMicrometres(below.height)} below) but the coupled-stripline formula assumes it centred between the planes; check it with the field solver`,
      );
    }
    return { kind: 'coupled-stripline', ...common, b } as LineSpec;
  }
  if (isCentred) return { kind: 'stripline', ...common, b } as LineSpec;
  return { kind: 'offset-stripline', ...common, h1: below.height, h2: above.height } as LineSpec;
}

/** The side's slabs as one Dk/Df, warning when they differ. */
function blendedSide(side: StackupSide, warnings: string[], mixing: { isMixed: boolean }, where: string): { relativePermittivity: number; lossTangent: number } {
  const blended = seriesDielectric(side.slabs);
  const values = distinctPermittivities(side.slabs);
  if (values.length > 1) {
    mixing.isMixed = true;
    warnings.push(`layers of Dk ${values.map(format).join(', ')} lie ${where}: the formula uses their thickness-weighted Dk of ${format(blended.relativePermittivity)}; the field solver takes the layers as they are`);
  }
  return blended;
}

function crossingWarnings(stackup: Stackup, layer: CopperLayer, sides: StackupSide[]): string[] {
  return sides
    .filter((side) => side.referenceIndex !== undefined && side.crossedSignalLayers.length > 0)
    .map(
      (side) =>
        `${side.crossedSignalLayers.join(', ')} lies between ${layer.name} and its reference ${stackup.layers[side.referenceIndex!].name}: its copper is taken as etched away and filled with resin`,
    );
}

function format(value: number): string {
  return Number(value.toPrecision(3)).toString();
}

function formatMicrometres(metres: number): string {
  return `${Number((metres * 1e6).toPrecision(3))} µm`;
}
