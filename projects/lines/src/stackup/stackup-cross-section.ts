/**
 * The cross-section of a line on a stackup layer as the layers really are, one
 * dielectric band per layer, for the field solver: where the formulas need one
 * blended Dk, the solver takes every layer's own.
 * Coordinates as in field/cross-section.ts: y = 0 on the lower reference plane.
 * A line referenced only from above is solved upside down (the field problem
 * is the same).
 */
import type { CrossSection, DielectricRegion, RectangleShape, SectionConductor } from '../field/cross-section';
import { fieldSolve, type FieldSolveOptions } from '../field/field-solve';
import { lineGeometryFor, type LineDimensions, type LineStructure } from './line-geometry-for';
import type { DielectricLayer, Stackup } from './stackup';
import { type Slab, seriesDielectric, stackupSide, type StackupSide } from './stackup-sides';

const ALL_WAYS = Infinity;

/** The layered cross-section of `structure` on copper layer `layerIndex`; throws LineInputError as lineGeometryFor does. */
export function stackupCrossSection(stackup: Stackup, layerIndex: number, structure: LineStructure, dimensions: LineDimensions): CrossSection {
  const geometry = lineGeometryFor(stackup, layerIndex, structure, dimensions);
  const above = stackupSide(stackup, layerIndex, -1);
  const below = stackupSide(stackup, layerIndex, 1);
  const isBuried = geometry.referenceIndices.length === 2;
  // The referenced side goes underneath; for a buried line, the side below stays below.
  const [lower, upper] = isBuried || below.referenceIndex !== undefined ? [below, above] : [above, below];
  const t = stackup.layers[layerIndex].thickness;
  const dielectrics: DielectricRegion[] = [];
  let y = 0;
  for (const slab of [...lower.slabs].reverse()) {
    dielectrics.push(band(slab.relativePermittivity, y, y + slab.thickness, nameOf(stackup, slab)));
    y += slab.thickness;
  }
  const stripBottom = y;
  const strips = stripRectangles(dimensions, structure, stripBottom, stripBottom + t);
  const coatingOnly = !isBuried && upper.slabs.length > 0 && upper.slabs.every((slab) => (stackup.layers[slab.layerIndex] as DielectricLayer).kind === 'coating');
  if (coatingOnly) {
    dielectrics.push(...conformalCoating(upper.slabs, strips, stripBottom));
  } else {
    const filler = stripLayerFiller(stackup, isBuried ? [upper, lower] : [upper]);
    if (filler) dielectrics.push(band(filler.relativePermittivity, stripBottom, stripBottom + t, `resin beside the strips (${filler.name})`));
    y = stripBottom + t;
    for (const slab of upper.slabs) {
      dielectrics.push(band(slab.relativePermittivity, y, y + slab.thickness, nameOf(stackup, slab)));
      y += slab.thickness;
    }
  }
  const conductors: SectionConductor[] = strips.map((shape, index) => ({ role: 'signal', shape, name: strips.length === 1 ? 'strip' : index === 0 ? 'left strip' : 'right strip' }));
  return { conductors, dielectrics, groundPlanes: isBuried ? { bottom: 0, top: y } : { bottom: 0 } };
}

/** Field-solver impedance of the placed line: z0, or zDiff for a pair [Ω]. */
export async function fieldSolveStackupLine(
  stackup: Stackup,
  layerIndex: number,
  structure: LineStructure,
  dimensions: LineDimensions,
  options: FieldSolveOptions = {},
): Promise<{ impedance: number; z0: number; erEff: number; zOdd?: number; zEven?: number; zDiff?: number; estimatedError: number; warnings: string[] }> {
  const solution = await fieldSolve(stackupCrossSection(stackup, layerIndex, structure, dimensions), options);
  const isPair = structure === 'pair';
  return {
    impedance: isPair ? solution.zDiff! : solution.z0,
    z0: solution.z0,
    erEff: isPair ? solution.erEffOdd! : solution.erEff,
    zOdd: solution.zOdd,
    zEven: solution.zEven,
    zDiff: solution.zDiff,
    estimatedError: solution.estimatedError,
    warnings: solution.warnings,
  };
}

function stripRectangles(dimensions: LineDimensions, structure: LineStructure, bottom: number, top: number): RectangleShape[] {
  const w = dimensions.width;
  const centres = structure === 'pair' ? [-(dimensions.gap! + w) / 2, (dimensions.gap! + w) / 2] : [0];
  return centres.map((centre) => ({ shape: 'rectangle', left: centre - w / 2, right: centre + w / 2, bottom, top }));
}

/** Solder mask follows the surface: its thickness over the laminate and over (and beside) each strip. */
function conformalCoating(slabs: Slab[], strips: RectangleShape[], surface: number): DielectricRegion[] {
  const c = slabs.reduce((sum, slab) => sum + slab.thickness, 0);
  const { relativePermittivity } = seriesDielectric(slabs);
  return [
    band(relativePermittivity, surface, surface + c, 'coating'),
    ...strips.map((strip) => ({ relativePermittivity, shape: { ...strip, left: strip.left - c, right: strip.right + c, top: strip.top + c }, name: 'coating' })),
  ];
}

/** The resin around a buried strip: the prepreg next to it if there is one, else the dielectric it sits on (as stackup-sides.ts). */
function stripLayerFiller(stackup: Stackup, sides: StackupSide[]): DielectricLayer | undefined {
  const neighbours = sides.map((side) => side.slabs[0]).filter((slab) => slab !== undefined).map((slab) => stackup.layers[slab.layerIndex]);
  const dielectrics = neighbours.filter((layer): layer is DielectricLayer => layer.type === 'dielectric');
  return dielectrics.find((layer) => layer.kind === 'prepreg') ?? dielectrics[dielectrics.length - 1];
}

function band(relativePermittivity: number, bottom: number, top: number, name: string): DielectricRegion {
  return { relativePermittivity, shape: { shape: 'rectangle', left: -ALL_WAYS, right: ALL_WAYS, bottom, top }, name };
}

function nameOf(stackup: Stackup, slab: Slab): string {
  return stackup.layers[slab.layerIndex].name;
}
