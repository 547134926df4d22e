/**
 * The units a person may pick for a field, by the kind of quantity it holds.
 * Factors come from the lines library's one conversion table.
 */
import { frequencyUnits, lengthUnits, type FieldQuantity, type TableUnit } from '@linewright/lines';

export interface UnitChoice {
  id: TableUnit | '';
  label: string;
}

export const LENGTH_CHOICES: readonly UnitChoice[] = [
  { id: 'mm', label: 'mm' },
  { id: 'um', label: 'µm' },
  { id: 'mil', label: 'mil' },
  { id: 'in', label: 'in' },
];

const COPPER_WEIGHT: UnitChoice = { id: 'oz', label: 'oz Cu' };

const FREQUENCY_CHOICES: readonly UnitChoice[] = (Object.keys(frequencyUnits) as TableUnit[]).map((id) => ({ id, label: id }));

/** Units offered for one field; thickness fields also accept copper weight. */
export function unitChoices(quantity: FieldQuantity, fieldName: string): readonly UnitChoice[] {
  if (quantity === 'length') return fieldName === 't' ? [...LENGTH_CHOICES, COPPER_WEIGHT] : LENGTH_CHOICES;
  if (quantity === 'frequency') return FREQUENCY_CHOICES;
  return [];
}

/** The factor from a display unit to SI; '' (no unit) is 1. */
export function unitFactor(unit: TableUnit | ''): number {
  if (unit === '') return 1;
  return (lengthUnits as Record<string, number>)[unit] ?? (frequencyUnits as Record<string, number>)[unit] ?? 1;
}

/** The SI suffix shown for fields without a unit choice. */
export function fixedUnitLabel(quantity: FieldQuantity): string {
  switch (quantity) {
    case 'conductivity':
      return 'S/m';
    case 'perLength':
      return '/m';
    case 'electricField':
      return 'V/m';
    default:
      return '';
  }
}
