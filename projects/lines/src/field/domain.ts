/**
 * The bounded rectangle the finite-difference grid covers, the conductor
 * "bodies" whose potentials are fixed, and the lines the grid must contain.
 *
 * Open sections are closed by a grounded box. The field of a line over a plane
 * (or of a balanced pair) is a dipole field far away, whose potential falls as
 * 1/r, so the energy left outside a box of size R falls as (S/R)² for a section
 * of size S. The graded grid reaches far for little: going from 30·S to 60·S
 * adds ~10 % cells. Measured on microstrip (test/lines/field/open-boundary.spec.ts):
 * walls at 30·S lower Z0 by ≈ 0.03–0.04 %, at 60·S by ≈ 0.01 %, well inside the
 * default tolerance (the estimated error does not include this). Between two
 * planes the field decays as exp(−π·x/gap), so there the side walls need only
 * be 4 gaps away.
 */
import type { CrossSection, Shape } from './cross-section';
import { shapeBounds, shapeContains, shapeLines } from './shapes';

/** Distance from the features to an open section's box walls, in section sizes. */
export const OPEN_BOUNDARY_DISTANCE = 60;
/** Distance from the features to the side walls between two planes, in plane gaps (exp(−4π) ≈ 3.5e-6). */
const PLATE_SIDE_DISTANCE = 4;
/** Geometric tolerance relative to the section size: points this close to a boundary count as on it. */
const RELATIVE_TOLERANCE = 1e-9;

export interface Box {
  left: number;
  right: number;
  bottom: number;
  top: number;
}

/** A closed range of one coordinate. */
export interface Span {
  start: number;
  end: number;
}

/**
 * What one direction of the grid needs: `corners` are conductor vertices, where
 * the field is singular and the grid grades down towards them; `wires` are the
 * extents of round conductors, fine all across; `aligned` lines (material
 * interfaces, walls, wire extremes) only have to be present.
 */
export interface DirectionLines {
  corners: number[];
  wires: Span[];
  aligned: number[];
}

export interface SolverDomain {
  box: Box;
  /** Extent of the conductors and dielectric edges; the grid is fine inside it and grows outside. */
  feature: Box;
  /** Characteristic size of the section: the larger side of `feature`. */
  size: number;
  tolerance: number;
  /** Vertical line about which the section may be mirror-symmetric. */
  axis: number;
  x: DirectionLines;
  y: DirectionLines;
  /** Body 0 is ground; body i (1…n) is the i-th signal conductor. */
  bodyCount: number;
  /** The index of the body containing (x, y), or −1 for the dielectric. */
  bodyAt(x: number, y: number): number;
}

/** Builds the solver domain of a validated cross-section. */
export function solverDomain(section: CrossSection): SolverDomain {
  const feature = featureBox(section);
  const size = Math.max(feature.right - feature.left, feature.top - feature.bottom);
  const tolerance = RELATIVE_TOLERANCE * size;
  const box = enclosingBox(section, feature, size);
  const x: DirectionLines = { corners: [], wires: [], aligned: [box.left, box.right] };
  const y: DirectionLines = { corners: [], wires: [], aligned: [box.bottom, box.top] };
  for (const { shape } of section.conductors) {
    if (shape.shape === 'circle') {
      x.wires.push({ start: shape.centerX - shape.radius, end: shape.centerX + shape.radius });
      y.wires.push({ start: shape.centerY - shape.radius, end: shape.centerY + shape.radius });
      addLines(shape, x.aligned, y.aligned);
    } else addLines(shape, x.corners, y.corners);
  }
  for (const region of section.dielectrics) addLines(region.shape, x.aligned, y.aligned);
  if (section.enclosure) addLines(section.enclosure, x.aligned, y.aligned);

  const signals = section.conductors.filter((conductor) => conductor.role === 'signal').map((conductor) => conductor.shape);
  const grounds = section.conductors.filter((conductor) => conductor.role === 'ground').map((conductor) => conductor.shape);
  const planes = section.groundPlanes ?? {};
  const enclosure = section.enclosure;
  const isGround = (px: number, py: number): boolean =>
    px <= box.left + tolerance ||
    px >= box.right - tolerance ||
    py <= box.bottom + tolerance ||
    py >= box.top - tolerance ||
    (planes.bottom !== undefined && py <= planes.bottom + tolerance) ||
    (planes.top !== undefined && py >= planes.top - tolerance) ||
    (enclosure !== undefined && isOutside(enclosure, px, py, tolerance)) ||
    grounds.some((shape) => shapeContains(shape, px, py, tolerance));

  return {
    box,
    feature,
    size,
    tolerance,
    axis: (box.left + box.right) / 2,
    x,
    y,
    bodyCount: signals.length + 1,
    bodyAt(px, py) {
      if (isGround(px, py)) return 0;
      for (let index = 0; index < signals.length; index++) {
        if (shapeContains(signals[index]!, px, py, tolerance)) return index + 1;
      }
      return -1;
    },
  };
}

function featureBox(section: CrossSection): Box {
  const box: Box = { left: Infinity, right: -Infinity, bottom: Infinity, top: -Infinity };
  const include = (shape: Shape): void => {
    const [left, right, bottom, top] = shapeBounds(shape);
    for (const value of [left, right]) if (Number.isFinite(value)) widen(box, value, undefined);
    for (const value of [bottom, top]) if (Number.isFinite(value)) widen(box, undefined, value);
  };
  section.conductors.forEach((conductor) => include(conductor.shape));
  section.dielectrics.forEach((region) => include(region.shape));
  const planes = section.groundPlanes ?? {};
  for (const plane of [planes.bottom, planes.top]) if (plane !== undefined) widen(box, undefined, plane);
  return box;
}

function enclosingBox(section: CrossSection, feature: Box, size: number): Box {
  if (section.enclosure) {
    const [left, right, bottom, top] = shapeBounds(section.enclosure);
    return { left, right, bottom, top };
  }
  const planes = section.groundPlanes ?? {};
  const open = OPEN_BOUNDARY_DISTANCE * size;
  const sides = planes.bottom !== undefined && planes.top !== undefined ? PLATE_SIDE_DISTANCE * (planes.top - planes.bottom) : open;
  return {
    left: feature.left - sides,
    right: feature.right + sides,
    bottom: planes.bottom ?? feature.bottom - open,
    top: planes.top ?? feature.top + open,
  };
}

function isOutside(enclosure: Shape, x: number, y: number, tolerance: number): boolean {
  if (enclosure.shape === 'circle') return Math.hypot(x - enclosure.centerX, y - enclosure.centerY) >= enclosure.radius - tolerance;
  const [left, right, bottom, top] = shapeBounds(enclosure);
  return x <= left + tolerance || x >= right - tolerance || y <= bottom + tolerance || y >= top - tolerance;
}

function addLines(shape: Shape, xs: number[], ys: number[]): void {
  const lines = shapeLines(shape);
  xs.push(...lines.x);
  ys.push(...lines.y);
}

function widen(box: Box, x: number | undefined, y: number | undefined): void {
  if (x !== undefined) {
    box.left = Math.min(box.left, x);
    box.right = Math.max(box.right, x);
  }
  if (y !== undefined) {
    box.bottom = Math.min(box.bottom, y);
    box.top = Math.max(box.top, y);
  }
}
