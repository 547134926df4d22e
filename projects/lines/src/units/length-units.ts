/**
 * The one table of unit conversion factors, importable without mathjs so the
 * browser can switch a field's unit instantly. SI inside the library, always.
 */
import { LineInputError } from '../errors';

/** One mil (thou) = 25.4 µm exactly (international inch, 1959). */
const MIL = 25.4e-6;

/**
 * Thickness of 1 oz/ft² copper foil [m]: 1.37 mil ≈ 34.8 µm, the figure on
 * fabricators' trade sheets (common practice, no source). From mass and
 * copper's density (8.96 g/cm³) it works out to ≈ 34.1 µm; the trade-sheet value
 * is used because stackup drawings and fabricators mean it when they write "1 oz".
 */
export const COPPER_OUNCE_THICKNESS = 1.37 * MIL;

/** Length units [m per unit]. 'oz' is copper weight (oz/ft²) read as foil thickness. */
export const lengthUnits = {
  m: 1,
  mm: 1e-3,
  um: 1e-6,
  'µm': 1e-6,
  mil: MIL,
  in: 0.0254,
  oz: COPPER_OUNCE_THICKNESS,
} as const;

/** Frequency units [Hz per unit]. */
export const frequencyUnits = {
  Hz: 1,
  kHz: 1e3,
  MHz: 1e6,
  GHz: 1e9,
} as const;

export type LengthUnit = keyof typeof lengthUnits;
export type FrequencyUnit = keyof typeof frequencyUnits;
export type TableUnit = LengthUnit | FrequencyUnit;

const factors: Record<string, number> = { ...lengthUnits, ...frequencyUnits, 'μm': 1e-6 };

function factor(unit: string): number {
  const value = factors[unit];
  if (value === undefined) throw new LineInputError('unit', `must be one of ${Object.keys(factors).join(', ')}`);
  return value;
}

/** A value in `unit` (e.g. 5, 'mil') to SI (metres or hertz). */
export function toSi(value: number, unit: TableUnit): number {
  return value * factor(unit);
}

/** An SI value (metres or hertz) in `unit`. */
export function fromSi(value: number, unit: TableUnit): number {
  return value / factor(unit);
}
