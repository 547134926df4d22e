/**
 * Impossible cross-sections throw LineInputError naming the offending field by
 * its path in the section, e.g. `conductors[1].shape.radius`.
 */
import { LineInputError } from '../errors';
import type { CrossSection, Shape } from './cross-section';

/** Throws LineInputError for the first impossible value in `section`. */
export function validateCrossSection(section: CrossSection): void {
  if (!section.conductors.some((conductor) => conductor.role === 'signal')) {
    throw new LineInputError('conductors', 'must contain at least one signal conductor');
  }
  section.conductors.forEach((conductor, index) => {
    const field = `conductors[${index}]`;
    if (conductor.role !== 'signal' && conductor.role !== 'ground') throw new LineInputError(`${field}.role`, "must be 'signal' or 'ground'");
    validateShape(`${field}.shape`, conductor.shape, conductor.role === 'ground');
  });
  section.dielectrics.forEach((region, index) => {
    validatePermittivity(`dielectrics[${index}].relativePermittivity`, region.relativePermittivity);
    validateShape(`dielectrics[${index}].shape`, region.shape, true);
  });
  if (section.backgroundPermittivity !== undefined) validatePermittivity('backgroundPermittivity', section.backgroundPermittivity);
  const planes = section.groundPlanes ?? {};
  for (const side of ['bottom', 'top'] as const) {
    const value = planes[side];
    if (value !== undefined && !Number.isFinite(value)) throw new LineInputError(`groundPlanes.${side}`, 'must be a finite number');
  }
  if (planes.bottom !== undefined && planes.top !== undefined && !(planes.top > planes.bottom)) {
    throw new LineInputError('groundPlanes.top', 'must be above groundPlanes.bottom');
  }
  if (section.enclosure) {
    validateShape('enclosure', section.enclosure, false);
    if (section.enclosure.shape === 'rectangle' && !(section.enclosure.right > section.enclosure.left && section.enclosure.top > section.enclosure.bottom)) {
      throw new LineInputError('enclosure', 'must have a positive width and height');
    }
  }
}

function validatePermittivity(field: string, value: number): void {
  if (!Number.isFinite(value) || value < 1) throw new LineInputError(field, 'must be a finite number of at least 1');
}

/** `mayReachWalls` lets a rectangle's left/right be ±Infinity (layers, ground pour). */
function validateShape(field: string, shape: Shape, mayReachWalls: boolean): void {
  const finite = (name: string, value: number): void => {
    if (!Number.isFinite(value)) throw new LineInputError(`${field}.${name}`, 'must be a finite number');
  };
  const nonNegative = (name: string, value: number): void => {
    finite(name, value);
    if (value < 0) throw new LineInputError(`${field}.${name}`, 'must not be negative');
  };
  switch (shape.shape) {
    case 'rectangle':
      for (const side of ['left', 'right'] as const) {
        if (!(mayReachWalls && Math.abs(shape[side]) === Infinity)) finite(side, shape[side]);
      }
      finite('bottom', shape.bottom);
      finite('top', shape.top);
      if (!(shape.right >= shape.left)) throw new LineInputError(`${field}.right`, 'must not be left of left');
      if (!(shape.top >= shape.bottom)) throw new LineInputError(`${field}.top`, 'must not be below bottom');
      return;
    case 'trapezoid':
      finite('centerX', shape.centerX);
      finite('bottom', shape.bottom);
      finite('top', shape.top);
      nonNegative('bottomWidth', shape.bottomWidth);
      nonNegative('topWidth', shape.topWidth);
      if (!(shape.top >= shape.bottom)) throw new LineInputError(`${field}.top`, 'must not be below bottom');
      if (shape.bottomWidth === 0 && shape.topWidth === 0) throw new LineInputError(`${field}.bottomWidth`, 'bottom or top width must be positive');
      return;
    case 'circle':
      finite('centerX', shape.centerX);
      finite('centerY', shape.centerY);
      finite('radius', shape.radius);
      if (!(shape.radius > 0)) throw new LineInputError(`${field}.radius`, 'must be greater than zero');
      return;
    default:
      throw new LineInputError(`${field}.shape`, "must be 'rectangle', 'trapezoid' or 'circle'");
  }
}
