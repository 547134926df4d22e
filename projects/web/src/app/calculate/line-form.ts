/**
 * The calculator's form model: one control per field of a line kind, holding
 * the number in the unit the person chose, and the SI spec derived from it.
 */
import { FormControl, FormRecord, Validators, type ValidatorFn } from '@angular/forms';
import { fromSi, type FieldDescription, type LineKind, type LineKindDescription, type LineSpec, type TableUnit } from '@linewright/lines';
import { trimmed } from '../shared/engineering-format';
import { unitChoices, unitFactor } from '../shared/unit-choices';

export type LineForm = FormRecord<FormControl<number | null>>;
export type UnitMap = Record<string, TableUnit | ''>;

/** Below this many metres a length reads better in µm than in mm. */
const MICRON_THRESHOLD = 0.1e-3;

/** The unit a field starts in: the preferred length unit, µm for thin foils, GHz for frequency. */
export function initialUnit(field: FieldDescription, preferredLength: TableUnit = 'mm'): TableUnit | '' {
  const choices = unitChoices(field.quantity, field.name);
  if (choices.length === 0) return '';
  if (field.quantity === 'frequency') return 'GHz';
  const value = typeof field.defaultValue === 'number' ? field.defaultValue : 0;
  if (preferredLength === 'mm' && value > 0 && value < MICRON_THRESHOLD) return 'um';
  return preferredLength;
}

function validatorsFor(field: FieldDescription): ValidatorFn[] {
  const validators: ValidatorFn[] = [];
  if (!field.isOptional) validators.push(Validators.required);
  return validators;
}

/** Limits are SI; the control holds the shown unit, so the check converts first. */
export function limitErrors(field: FieldDescription, siValue: number): Record<string, true> | null {
  if (field.min !== undefined && (field.minExclusive ? siValue <= field.min : siValue < field.min)) return { min: true };
  if (field.max !== undefined && siValue > field.max) return { max: true };
  return null;
}

/** `unitOf` is read at validation time, so a unit switch re-checks against the limits. */
export function buildLineForm(kind: LineKindDescription, initialUnits: UnitMap, unitOf: (field: string) => TableUnit | ''): LineForm {
  const form: LineForm = new FormRecord<FormControl<number | null>>({});
  for (const field of kind.fields) {
    if (field.quantity === 'boolean') continue;
    const unit = initialUnits[field.name] ?? '';
    const initial = typeof field.defaultValue === 'number' ? Number(trimmed(fromSiOrPlain(field.defaultValue, unit), 6)) : null;
    const control = new FormControl<number | null>(field.isOptional ? null : initial, validatorsFor(field));
    control.addValidators((c) => (c.value === null ? null : limitErrors(field, c.value * unitFactor(unitOf(field.name)))));
    form.addControl(field.name, control);
  }
  return form;
}

function fromSiOrPlain(value: number, unit: TableUnit | ''): number {
  return unit === '' ? value : fromSi(value, unit);
}

/** How the conductor surface is modelled; picks which roughness inputs apply. */
export type SurfaceModel = 'smooth' | 'hammerstad-bekkadal' | 'huray';

/** Choices beside the numeric inputs: on/off fields, the method, the surface model. */
export interface LineChoices {
  flags: Record<string, boolean>;
  method?: string;
  surface: SurfaceModel;
}

const SURFACE_FIELDS: Record<string, SurfaceModel> = {
  roughness: 'hammerstad-bekkadal',
  noduleRadius: 'huray',
  noduleSurfaceRatio: 'huray',
};

/** Whether a field takes part under the chosen surface model (roughness inputs only under their own model). */
export function isFieldInUse(field: FieldDescription, surface: SurfaceModel): boolean {
  const model = SURFACE_FIELDS[field.name];
  return model === undefined || model === surface;
}

/** The SI spec from the form's values; `undefined` while a required field is empty or invalid. */
export function specFromForm(
  kind: LineKindDescription,
  values: Partial<Record<string, number | null>>,
  units: UnitMap,
  choices: LineChoices,
  unknown?: string,
): LineSpec | undefined {
  const spec: Record<string, unknown> = { kind: kind.kind as LineKind };
  for (const field of kind.fields) {
    if (!isFieldInUse(field, choices.surface)) continue;
    if (field.quantity === 'boolean') {
      if (choices.flags[field.name]) spec[field.name] = true;
      continue;
    }
    if (field.name === unknown) {
      // The unknown's own value only starts the search; the solver replaces it.
      spec[field.name] = typeof field.defaultValue === 'number' ? field.defaultValue : 1;
      continue;
    }
    const value = values[field.name];
    if (value === null || value === undefined || !Number.isFinite(value)) {
      if (!field.isOptional) return undefined;
      continue;
    }
    const si = value * unitFactor(units[field.name] ?? '');
    if (limitErrors(field, si)) return undefined;
    spec[field.name] = si;
  }
  if (choices.method) spec['method'] = choices.method;
  if (choices.surface !== 'smooth') spec['roughnessModel'] = choices.surface;
  return spec as unknown as LineSpec;
}
