/**
 * Turns a line's cross-section (the same one the field solver uses) into
 * drawable primitives in metres, with dimension marks named after the spec's
 * own fields. Pure, so its geometry is unit-tested without a browser.
 */
import type { CrossSection, LineSpec, Shape } from '@linewright/lines';

export interface Box {
  left: number;
  right: number;
  bottom: number;
  top: number;
}

export type Paint = 'signal' | 'ground' | 'dielectric' | 'cover' | 'plane';

export type Primitive =
  | { type: 'polygon'; paint: Paint; points: [number, number][]; permittivity?: number }
  | { type: 'circle'; paint: Paint; cx: number; cy: number; r: number };

/** A dimension mark between two points, labelled with the spec field it shows. */
export interface Dimension {
  field: string;
  value: number;
  from: [number, number];
  to: [number, number];
  /** Which way the label sits from the line. */
  side: 'above' | 'below' | 'left' | 'right';
}

export interface SectionLayout {
  view: Box;
  primitives: Primitive[];
  dimensions: Dimension[];
}

/** How far the drawing reaches past the conductors, relative to the section's height. */
const SIDE_MARGIN = 1.4;
/** Drawn thickness of a solid plane, relative to the view height. */
const PLANE_DEPTH = 0.08;

function bounds(shape: Shape): Box {
  switch (shape.shape) {
    case 'rectangle':
      return { left: shape.left, right: shape.right, bottom: shape.bottom, top: shape.top };
    case 'trapezoid': {
      const half = Math.max(shape.bottomWidth, shape.topWidth) / 2;
      return { left: shape.centerX - half, right: shape.centerX + half, bottom: shape.bottom, top: shape.top };
    }
    case 'circle':
      return { left: shape.centerX - shape.radius, right: shape.centerX + shape.radius, bottom: shape.centerY - shape.radius, top: shape.centerY + shape.radius };
  }
}

function clip(box: Box, view: Box): Box {
  return { left: Math.max(box.left, view.left), right: Math.min(box.right, view.right), bottom: Math.max(box.bottom, view.bottom), top: Math.min(box.top, view.top) };
}

function primitive(shape: Shape, paint: Paint, view: Box, permittivity?: number): Primitive {
  if (shape.shape === 'circle') return { type: 'circle', paint, cx: shape.centerX, cy: shape.centerY, r: shape.radius };
  if (shape.shape === 'trapezoid') {
    const { centerX: x, bottom, top, bottomWidth, topWidth } = shape;
    return { type: 'polygon', paint, permittivity, points: [[x - bottomWidth / 2, bottom], [x + bottomWidth / 2, bottom], [x + topWidth / 2, top], [x - topWidth / 2, top]] };
  }
  const box = clip(bounds(shape), view);
  return { type: 'polygon', paint, permittivity, points: [[box.left, box.bottom], [box.right, box.bottom], [box.right, box.top], [box.left, box.top]] };
}

/** The region worth drawing: the signal conductors and everything near them. */
function viewOf(section: CrossSection): Box {
  const finite = (values: number[]) => values.filter(Number.isFinite);
  const signals = section.conductors.filter((conductor) => conductor.role === 'signal').map((conductor) => bounds(conductor.shape));
  const shapes = [...section.conductors.map((c) => bounds(c.shape)), ...section.dielectrics.map((d) => bounds(d.shape))];
  if (section.enclosure) shapes.push(bounds(section.enclosure));
  const tops = finite([...shapes.map((box) => box.top), section.groundPlanes?.top ?? Number.NaN]);
  const bottoms = finite([...shapes.map((box) => box.bottom), section.groundPlanes?.bottom ?? Number.NaN]);
  let top = Math.max(...tops);
  let bottom = Math.min(...bottoms);
  if (section.groundPlanes?.top === undefined && !section.enclosure) top += (top - bottom) * 0.6;
  const height = top - bottom;
  const left = Math.min(...signals.map((box) => box.left));
  const right = Math.max(...signals.map((box) => box.right));
  const reach = section.enclosure ? 0 : Math.max(height * SIDE_MARGIN, (right - left) * 0.6);
  const planeDepth = height * PLANE_DEPTH;
  if (section.groundPlanes?.bottom !== undefined) bottom -= planeDepth;
  if (section.groundPlanes?.top !== undefined) top += planeDepth;
  const enclosure = section.enclosure ? bounds(section.enclosure) : undefined;
  return enclosure
    ? { left: enclosure.left * 1.25, right: enclosure.right * 1.25, bottom: enclosure.bottom * 1.25, top: enclosure.top * 1.25 }
    : { left: left - reach, right: right + reach, bottom, top };
}

export function sectionLayout(section: CrossSection, spec: LineSpec): SectionLayout {
  const view = viewOf(section);
  const primitives: Primitive[] = [];
  if (section.enclosure?.shape === 'circle') {
    const { centerX, centerY, radius } = section.enclosure;
    primitives.push({ type: 'circle', paint: 'plane', cx: centerX, cy: centerY, r: radius * 1.12 });
    primitives.push({ type: 'circle', paint: 'dielectric', cx: centerX, cy: centerY, r: radius });
  } else if ((section.backgroundPermittivity ?? 1) > 1) {
    primitives.push(primitive({ shape: 'rectangle', ...view }, 'dielectric', view, section.backgroundPermittivity));
  }
  for (const region of section.dielectrics) {
    primitives.push(primitive(region.shape, region.name?.includes('cover') || region.name?.includes('coating') ? 'cover' : 'dielectric', view, region.relativePermittivity));
  }
  if (section.groundPlanes?.bottom !== undefined) {
    primitives.push(primitive({ shape: 'rectangle', left: view.left, right: view.right, bottom: view.bottom, top: section.groundPlanes.bottom }, 'plane', view));
  }
  if (section.groundPlanes?.top !== undefined) {
    primitives.push(primitive({ shape: 'rectangle', left: view.left, right: view.right, bottom: section.groundPlanes.top, top: view.top }, 'plane', view));
  }
  for (const conductor of section.conductors) primitives.push(primitive(conductor.shape, conductor.role, view));
  return { view, primitives, dimensions: dimensionsOf(section, spec) };
}

/** Dimension marks for the fields the spec has, placed on the drawn shapes. */
function dimensionsOf(section: CrossSection, spec: LineSpec): Dimension[] {
  const has = (field: string) => typeof (spec as unknown as Record<string, unknown>)[field] === 'number';
  const value = (field: string) => (spec as unknown as Record<string, number>)[field];
  const signals = section.conductors.filter((conductor) => conductor.role === 'signal').map((conductor) => bounds(conductor.shape)).sort((a, b) => a.left - b.left);
  const dimensions: Dimension[] = [];
  if (signals.length === 0) return dimensions;
  const first = signals[0];
  const last = signals[signals.length - 1];
  const planeBottom = section.groundPlanes?.bottom ?? 0;

  if (spec.kind === 'coax' || spec.kind === 'twin-lead' || spec.kind === 'twisted-pair' || spec.kind === 'wire-over-ground') {
    const centreY = (first.bottom + first.top) / 2;
    dimensions.push({ field: 'd', value: value('d'), from: [first.left, centreY], to: [first.right, centreY], side: 'below' });
    if (has('D') && section.enclosure?.shape === 'circle') {
      const r = section.enclosure.radius;
      dimensions.push({ field: 'D', value: value('D'), from: [-r, -r * 1.05], to: [r, -r * 1.05], side: 'below' });
    }
    if (has('s') && signals.length > 1) {
      const top = Math.max(first.top, last.top);
      dimensions.push({ field: 's', value: value('s'), from: [(first.left + first.right) / 2, top], to: [(last.left + last.right) / 2, top], side: 'above' });
    }
    if (spec.kind === 'wire-over-ground') {
      dimensions.push({ field: 'h', value: value('h'), from: [first.right, planeBottom], to: [first.right, centreY], side: 'right' });
    }
    return dimensions;
  }

  dimensions.push({ field: 'w', value: value('w'), from: [first.left, first.top], to: [first.right, first.top], side: 'above' });
  dimensions.push({ field: 't', value: value('t'), from: [last.right, last.bottom], to: [last.right, last.top], side: 'right' });
  const gapField = has('g') ? 'g' : has('s') ? 's' : undefined;
  if (gapField && signals.length > 1) {
    dimensions.push({ field: gapField, value: value(gapField), from: [first.right, first.bottom], to: [signals[1].left, first.bottom], side: 'below' });
  } else if (gapField === 'g') {
    const ground = section.conductors.find((conductor) => conductor.role === 'ground' && bounds(conductor.shape).left > first.right);
    if (ground) dimensions.push({ field: 'g', value: value('g'), from: [first.right, first.bottom], to: [bounds(ground.shape).left, first.bottom], side: 'below' });
  }
  const lowField = has('h1') ? 'h1' : has('h') ? 'h' : undefined;
  if (lowField) dimensions.push({ field: lowField, value: value(lowField), from: [first.left, planeBottom], to: [first.left, first.bottom], side: 'left' });
  if (has('h2') && section.groundPlanes?.top !== undefined) {
    dimensions.push({ field: 'h2', value: value('h2'), from: [first.left, first.top], to: [first.left, section.groundPlanes.top], side: 'left' });
  }
  if (has('b') && section.groundPlanes?.top !== undefined) {
    // At the far side of the drawing, clear of the strip's own marks.
    const x = first.left - (last.right - first.left) * 1.6 - (section.groundPlanes.top - planeBottom) * 0.3;
    dimensions.push({ field: 'b', value: value('b'), from: [x, planeBottom], to: [x, section.groundPlanes.top], side: 'left' });
  }
  if (has('cover')) {
    const surface = has('h') ? value('h') : first.bottom;
    const x = last.right + (last.right - first.left) * 0.9;
    dimensions.push({ field: 'cover', value: value('cover'), from: [x, surface], to: [x, surface + value('cover')], side: 'right' });
  }
  return dimensions;
}
