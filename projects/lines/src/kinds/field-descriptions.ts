/**
 * Builders for field descriptions, and the fields every kind shares
 * (material and operating conditions). Defaults describe a typical FR-4 board
 * at 1 GHz; 34.8 µm is 1 oz/ft² copper (trade-sheet value, see units/length-units.ts).
 */
import { COPPER_CONDUCTIVITY } from '../constants';
import type { FieldDescription } from './line-model';

/** A geometry length that must be greater than zero. */
export function positiveLength(name: string, label: string, description: string, defaultValue: number): FieldDescription {
  return { name, label, description, quantity: 'length', isLength: true, isOptional: false, defaultValue, min: 0, minExclusive: true, group: 'geometry' };
}

/** A conductor thickness: zero is allowed (the thin-strip limit of the methods). */
export function thicknessField(defaultValue: number): FieldDescription {
  return {
    name: 't',
    label: 'Strip thickness',
    description: 'Thickness of the strip conductor (0 for the thin-strip limit).',
    quantity: 'length',
    isLength: true,
    isOptional: false,
    defaultValue,
    min: 0,
    minExclusive: false,
    group: 'geometry',
  };
}

/** Material and operating inputs accepted by every kind (CommonLineFields). */
export const commonFields: readonly FieldDescription[] = [
  { name: 'er', label: 'Dielectric constant (Dk)', description: 'Relative permittivity of the dielectric.', quantity: 'relativePermittivity', isLength: false, isOptional: false, defaultValue: 4.3, min: 1, minExclusive: false, group: 'material' },
  { name: 'tanDelta', label: 'Loss tangent (Df)', description: 'Dielectric loss tangent; 0 for a lossless dielectric.', quantity: 'lossTangent', isLength: false, isOptional: true, defaultValue: 0.02, min: 0, minExclusive: false, group: 'material' },
  { name: 'conductivity', label: 'Conductivity', description: 'Conductor conductivity; default annealed copper.', quantity: 'conductivity', isLength: false, isOptional: true, defaultValue: COPPER_CONDUCTIVITY, min: 0, minExclusive: true, group: 'material' },
  { name: 'roughness', label: 'Surface roughness (RMS)', description: 'RMS height of the conductor surface profile.', quantity: 'length', isLength: true, isOptional: true, defaultValue: 0, min: 0, minExclusive: false, group: 'material' },
  { name: 'noduleRadius', label: 'Nodule radius (Huray)', description: 'Radius of the copper nodules, for roughnessModel "huray".', quantity: 'length', isLength: true, isOptional: true, defaultValue: 0.5e-6, min: 0, minExclusive: true, group: 'material' },
  { name: 'noduleSurfaceRatio', label: 'Nodule surface ratio (Huray)', description: 'Nodule surface per flat surface, N·4πa²/A, for roughnessModel "huray".', quantity: 'dimensionless', isLength: false, isOptional: true, defaultValue: 1, min: 0, minExclusive: false, group: 'material' },
  { name: 'dielectricReferenceFrequency', label: 'Dk/Df measured at', description: 'Frequency of the Dk/Df values; when given, a wideband causal model (Djordjevic–Sarkar) carries them to the working frequency.', quantity: 'frequency', isLength: false, isOptional: true, defaultValue: 1e9, min: 0, minExclusive: true, group: 'material' },
  { name: 'frequency', label: 'Frequency', description: 'Frequency for losses and dispersion.', quantity: 'frequency', isLength: false, isOptional: true, defaultValue: 1e9, min: 0, minExclusive: true, group: 'operating' },
  { name: 'length', label: 'Line length', description: 'Physical length for delay, loss and electrical length.', quantity: 'length', isLength: true, isOptional: true, defaultValue: 0.1, min: 0, minExclusive: false, group: 'operating' },
];
