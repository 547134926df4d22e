/**
 * Every formula kind's LineSpec as a cross-section, so any calculator result can
 * be checked with the field solver, plus the departures from the formulas'
 * idealised shapes that real boards have: etched (trapezoid) strips, a
 * conformal coating over the top, and a different εr above a buried strip.
 * Coordinates: x = 0 on the line's axis of symmetry, y = 0 on the lowest plane
 * (or the bottom of the substrate when there is none).
 */
import { LineInputError } from '../errors';
import type { LineSpec } from '../types';
import { validateSpec } from '../validate-spec';
import type { CrossSection, DielectricRegion, SectionConductor, Shape, TrapezoidShape } from './cross-section';

/** Changes to the idealised section of a spec, as the cross-section editor offers them. */
export interface CrossSectionOptions {
  /** Top width of every strip [m]: the strips become trapezoids (bottom width w). */
  stripTopWidth?: number;
  /** Or the etch angle between a strip's side and the board [rad], π/2 = vertical sides; top width = w − 2t/tan(angle). */
  etchAngle?: number;
  /** A conformal coating (solder mask) over the top surface and the strips; surface kinds only. */
  coating?: { thickness: number; relativePermittivity: number };
  /** εr of the dielectric from the strip's lower face up to the upper plane (prepreg), with `er` below (core); stripline kinds only. */
  erAbove?: number;
}

const ALL_WAYS = Infinity;
const SURFACE_KINDS: readonly LineSpec['kind'][] = ['microstrip', 'coupled-microstrip', 'cpw'];
const BURIED_KINDS: readonly LineSpec['kind'][] = ['stripline', 'offset-stripline', 'coupled-stripline'];
const WIRE_KINDS: readonly LineSpec['kind'][] = ['coax', 'twin-lead', 'wire-over-ground', 'twisted-pair'];

/** The cross-section of `spec`, with `options` applied. Throws LineInputError for impossible input. */
export function crossSectionFromSpec(spec: LineSpec, options: CrossSectionOptions = {}): CrossSection {
  validateSpec(spec);
  validateOptions(spec, options);
  switch (spec.kind) {
    case 'coax':
      return {
        conductors: [signal(circle(0, 0, spec.d / 2), 'inner conductor')],
        dielectrics: [],
        backgroundPermittivity: spec.er,
        enclosure: circle(0, 0, spec.D / 2),
      };
    case 'twin-lead':
      return { conductors: wirePair(spec.d, spec.s), dielectrics: [], backgroundPermittivity: spec.er };
    case 'twisted-pair':
      // Touching insulated wires, insulation out to s/2; the twist itself is 3D and is not modelled.
      return {
        conductors: wirePair(spec.d, spec.s),
        dielectrics: [-1, 1].map((side) => ({ relativePermittivity: spec.er, shape: circle((side * spec.s) / 2, 0, spec.s / 2), name: 'insulation' })),
      };
    case 'wire-over-ground':
      return { conductors: [signal(circle(0, spec.h, spec.d / 2), 'wire')], dielectrics: [], backgroundPermittivity: spec.er, groundPlanes: { bottom: 0 } };
    case 'microstrip':
    case 'coupled-microstrip':
    case 'embedded-microstrip':
      return surfaceSection(spec, spec.kind === 'coupled-microstrip' ? spec.s : undefined, options);
    case 'cpw': {
      const section = surfaceSection(spec, undefined, options);
      const inner = spec.w / 2 + spec.g;
      section.conductors.push(
        { role: 'ground', shape: rectangle(inner, ALL_WAYS, spec.h, spec.h + spec.t), name: 'right ground' },
        { role: 'ground', shape: rectangle(-ALL_WAYS, -inner, spec.h, spec.h + spec.t), name: 'left ground' },
      );
      if (spec.grounded) section.groundPlanes = { bottom: 0 };
      return section;
    }
    case 'stripline':
      return buriedSection(spec.w, undefined, (spec.b - spec.t) / 2, spec.t, spec.b, spec.er, options);
    case 'offset-stripline':
      return buriedSection(spec.w, undefined, spec.h1, spec.t, spec.h1 + spec.t + spec.h2, spec.er, options);
    case 'coupled-stripline':
      return buriedSection(spec.w, spec.s, (spec.b - spec.t) / 2, spec.t, spec.b, spec.er, options);
  }
}

/** Strip(s) on a substrate over a plane (no plane for coplanar waveguide), optionally under a cover or coating. */
function surfaceSection(
  spec: Extract<LineSpec, { kind: 'microstrip' | 'coupled-microstrip' | 'embedded-microstrip' | 'cpw' }>,
  gap: number | undefined,
  options: CrossSectionOptions,
): CrossSection {
  const strips = stripShapes(spec.w, gap, spec.h, spec.t, options);
  const dielectrics: DielectricRegion[] = [{ relativePermittivity: spec.er, shape: rectangle(-ALL_WAYS, ALL_WAYS, 0, spec.h), name: 'substrate' }];
  if (spec.kind === 'embedded-microstrip') {
    const erCover = spec.erCover ?? spec.er;
    dielectrics.push({ relativePermittivity: erCover, shape: rectangle(-ALL_WAYS, ALL_WAYS, spec.h, spec.h + spec.cover), name: 'cover' });
  }
  if (options.coating) {
    const { thickness: c, relativePermittivity } = options.coating;
    dielectrics.push({ relativePermittivity, shape: rectangle(-ALL_WAYS, ALL_WAYS, spec.h, spec.h + c), name: 'coating' });
    for (const strip of strips) {
      const coat: TrapezoidShape = { ...strip, top: strip.top + c, bottomWidth: strip.bottomWidth + 2 * c, topWidth: strip.topWidth + 2 * c };
      dielectrics.push({ relativePermittivity, shape: coat, name: 'coating' });
    }
  }
  const isCpw = spec.kind === 'cpw';
  return {
    conductors: strips.map((shape, index) => signal(shape, stripName(strips.length, index))),
    dielectrics,
    groundPlanes: isCpw ? undefined : { bottom: 0 },
  };
}

/** Strip(s) between two planes, the lower face at `bottom`; `er` below the strip's lower face and `erAbove` from there up. */
function buriedSection(w: number, gap: number | undefined, bottom: number, t: number, top: number, er: number, options: CrossSectionOptions): CrossSection {
  const strips = stripShapes(w, gap, bottom, t, options);
  const erAbove = options.erAbove;
  return {
    conductors: strips.map((shape, index) => signal(shape, stripName(strips.length, index))),
    dielectrics: erAbove === undefined ? [] : [{ relativePermittivity: erAbove, shape: rectangle(-ALL_WAYS, ALL_WAYS, bottom, top), name: 'upper dielectric' }],
    backgroundPermittivity: er,
    groundPlanes: { bottom: 0, top },
  };
}

/** One strip centred on x = 0, or two with edge gap `gap`, as trapezoids from y = bottom to bottom + t. */
function stripShapes(w: number, gap: number | undefined, bottom: number, t: number, options: CrossSectionOptions): TrapezoidShape[] {
  const topWidth = options.stripTopWidth ?? (options.etchAngle !== undefined ? w - (2 * t) / Math.tan(options.etchAngle) : w);
  if (!(topWidth > 0)) throw new LineInputError(options.stripTopWidth !== undefined ? 'stripTopWidth' : 'etchAngle', 'leaves no top width: the strip would be a triangle');
  const centres = gap === undefined ? [0] : [-(gap + w) / 2, (gap + w) / 2];
  return centres.map((centerX) => ({ shape: 'trapezoid', centerX, bottom, top: bottom + t, bottomWidth: w, topWidth }));
}

function validateOptions(spec: LineSpec, options: CrossSectionOptions): void {
  const isWire = WIRE_KINDS.includes(spec.kind);
  if (options.stripTopWidth !== undefined) {
    if (isWire) throw new LineInputError('stripTopWidth', 'applies to strip kinds only');
    if (!(options.stripTopWidth > 0 && Number.isFinite(options.stripTopWidth))) throw new LineInputError('stripTopWidth', 'must be greater than zero');
  }
  if (options.etchAngle !== undefined) {
    if (isWire) throw new LineInputError('etchAngle', 'applies to strip kinds only');
    if (!(options.etchAngle > 0 && options.etchAngle <= Math.PI / 2)) throw new LineInputError('etchAngle', 'must be in (0, π/2]');
  }
  if (options.coating) {
    if (!SURFACE_KINDS.includes(spec.kind)) throw new LineInputError('coating', 'applies to microstrip, coupled microstrip and coplanar waveguide');
    if (!(options.coating.thickness > 0 && Number.isFinite(options.coating.thickness))) throw new LineInputError('coating.thickness', 'must be greater than zero');
    if (!(options.coating.relativePermittivity >= 1)) throw new LineInputError('coating.relativePermittivity', 'must be at least 1');
  }
  if (options.erAbove !== undefined) {
    if (!BURIED_KINDS.includes(spec.kind)) throw new LineInputError('erAbove', 'applies to stripline kinds only');
    if (!(options.erAbove >= 1 && Number.isFinite(options.erAbove))) throw new LineInputError('erAbove', 'must be at least 1');
  }
}

function wirePair(d: number, s: number): SectionConductor[] {
  return [signal(circle(-s / 2, 0, d / 2), 'left wire'), signal(circle(s / 2, 0, d / 2), 'right wire')];
}

function stripName(count: number, index: number): string {
  return count === 1 ? 'strip' : index === 0 ? 'left strip' : 'right strip';
}

function signal(shape: Shape, name: string): SectionConductor {
  return { role: 'signal', shape, name };
}

function circle(centerX: number, centerY: number, radius: number): Shape & { shape: 'circle' } {
  return { shape: 'circle', centerX, centerY, radius };
}

function rectangle(left: number, right: number, bottom: number, top: number): Shape & { shape: 'rectangle' } {
  return { shape: 'rectangle', left, right, bottom, top };
}
