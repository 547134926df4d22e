/**
 * Units a person may type the circuit's quantities in. Times, capacitances
 * and frequencies are SI prefixes; lengths take their factors from the lines
 * library's one conversion table.
 */
import { frequencyUnits, lengthUnits } from '@linewright/lines';

export interface UnitScale {
  id: string;
  label: string;
  /** SI units per one of this unit. */
  factor: number;
}

export const TIME_UNITS: readonly UnitScale[] = [
  { id: 'ps', label: 'ps', factor: 1e-12 },
  { id: 'ns', label: 'ns', factor: 1e-9 },
  { id: 'us', label: 'µs', factor: 1e-6 },
  { id: 'ms', label: 'ms', factor: 1e-3 },
  { id: 's', label: 's', factor: 1 },
];

export const CAPACITANCE_UNITS: readonly UnitScale[] = [
  { id: 'fF', label: 'fF', factor: 1e-15 },
  { id: 'pF', label: 'pF', factor: 1e-12 },
  { id: 'nF', label: 'nF', factor: 1e-9 },
  { id: 'uF', label: 'µF', factor: 1e-6 },
];

/** One foot is twelve inches (international inch, 1959). */
const INCHES_PER_FOOT = 12;

export const CABLE_LENGTH_UNITS: readonly UnitScale[] = [
  { id: 'mm', label: 'mm', factor: lengthUnits.mm },
  { id: 'm', label: 'm', factor: lengthUnits.m },
  { id: 'km', label: 'km', factor: 1e3 * lengthUnits.m },
  { id: 'in', label: 'in', factor: lengthUnits.in },
  { id: 'ft', label: 'ft', factor: INCHES_PER_FOOT * lengthUnits.in },
];

export const FREQUENCY_UNITS: readonly UnitScale[] = (Object.keys(frequencyUnits) as (keyof typeof frequencyUnits)[]).map((id) => ({
  id,
  label: id,
  factor: frequencyUnits[id],
}));

/** The factor of `id` in `scales`; an unknown id counts as the first unit's. */
export function factorOf(scales: readonly UnitScale[], id: string): number {
  return (scales.find((scale) => scale.id === id) ?? scales[0]).factor;
}
