/**
 * Geometry of the section's shapes: point membership (boundary included) and
 * the coordinates the grid must contain so that every straight edge and corner
 * falls on a grid line.
 */
import type { CircleShape, CrossSection, Shape } from './cross-section';

/** Corner coordinates of a shape, split by direction; only finite values. */
export interface ShapeLines {
  x: number[];
  y: number[];
}

/** True when (x, y) lies inside `shape` or within `tolerance` of its boundary. */
export function shapeContains(shape: Shape, x: number, y: number, tolerance: number): boolean {
  switch (shape.shape) {
    case 'rectangle':
      return (
        x >= shape.left - tolerance && x <= shape.right + tolerance && y >= shape.bottom - tolerance && y <= shape.top + tolerance
      );
    case 'trapezoid': {
      if (y < shape.bottom - tolerance || y > shape.top + tolerance) return false;
      const height = shape.top - shape.bottom;
      const along = height > 0 ? Math.min(1, Math.max(0, (y - shape.bottom) / height)) : 0;
      const halfWidth = (shape.bottomWidth + (shape.topWidth - shape.bottomWidth) * along) / 2;
      // The tolerance is a distance normal to a slanted side, so widen it by 1/cos of the side's angle.
      const slope = height > 0 ? Math.abs(shape.topWidth - shape.bottomWidth) / (2 * height) : 0;
      return Math.abs(x - shape.centerX) <= halfWidth + tolerance * Math.sqrt(1 + slope * slope);
    }
    case 'circle':
      return Math.hypot(x - shape.centerX, y - shape.centerY) <= shape.radius + tolerance;
  }
}

/** Relative permittivity at (x, y): the background, then the dielectric regions painted in order. */
export function permittivityAt(section: CrossSection, x: number, y: number): number {
  let value = section.backgroundPermittivity ?? 1;
  for (const region of section.dielectrics) if (shapeContains(region.shape, x, y, 0)) value = region.relativePermittivity;
  return value;
}

/** The grid lines a shape needs: its vertices, or a circle's centre and extremes (its curved boundary is handled by cut links). */
export function shapeLines(shape: Shape): ShapeLines {
  switch (shape.shape) {
    case 'rectangle':
      return { x: finite([shape.left, shape.right]), y: finite([shape.bottom, shape.top]) };
    case 'trapezoid': {
      const { centerX: c, bottomWidth: wb, topWidth: wt } = shape;
      return { x: [c - wb / 2, c + wb / 2, c - wt / 2, c + wt / 2], y: [shape.bottom, shape.top] };
    }
    case 'circle':
      return circleLines(shape);
  }
}

/** Finite bounding box of a shape ([-Inf, Inf] sides dropped), as [left, right, bottom, top]. */
export function shapeBounds(shape: Shape): [number, number, number, number] {
  switch (shape.shape) {
    case 'rectangle':
      return [shape.left, shape.right, shape.bottom, shape.top];
    case 'trapezoid': {
      const half = Math.max(shape.bottomWidth, shape.topWidth) / 2;
      return [shape.centerX - half, shape.centerX + half, shape.bottom, shape.top];
    }
    case 'circle':
      return [shape.centerX - shape.radius, shape.centerX + shape.radius, shape.centerY - shape.radius, shape.centerY + shape.radius];
  }
}

function circleLines({ centerX: x, centerY: y, radius: r }: CircleShape): ShapeLines {
  return { x: [x - r, x, x + r], y: [y - r, y, y + r] };
}

function finite(values: number[]): number[] {
  return values.filter((value) => Number.isFinite(value));
}
