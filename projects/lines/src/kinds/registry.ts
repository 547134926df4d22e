/**
 * Every line kind the library computes, keyed by `kind`. Adding a kind is one
 * file under kinds/ plus one entry in `models`. The Angular forms and the API
 * documents are built from `lineKinds` / `kindFields(kind)`.
 */
import { LineInputError } from '../errors';
import type { LineKind, LineSpec } from '../types';
import type { ValidityRange } from '../validation';
import { coaxModel } from './coax';
import { commonFields } from './field-descriptions';
import type { AnyLineModel, FieldDescription, LineModel, MethodOption } from './line-model';
import { coupledMicrostripModel } from './coupled-microstrip';
import { coupledStriplineModel } from './coupled-stripline';
import { cpwModel } from './cpw';
import { embeddedMicrostripModel } from './embedded-microstrip';
import { microstripModel } from './microstrip';
import { offsetStriplineModel } from './offset-stripline';
import { striplineModel } from './stripline';
import { twinLeadModel } from './twin-lead';
import { twistedPairModel } from './twisted-pair';
import { wireOverGroundModel } from './wire-over-ground';

const models: { [K in LineKind]: LineModel<Extract<LineSpec, { kind: K }>> } = {
  microstrip: microstripModel,
  'embedded-microstrip': embeddedMicrostripModel,
  stripline: striplineModel,
  'offset-stripline': offsetStriplineModel,
  cpw: cpwModel,
  'coupled-microstrip': coupledMicrostripModel,
  'coupled-stripline': coupledStriplineModel,
  coax: coaxModel,
  'twin-lead': twinLeadModel,
  'wire-over-ground': wireOverGroundModel,
  'twisted-pair': twistedPairModel,
};

/** What a form or API document needs to know about one kind; plain data (JSON-safe). */
export interface LineKindDescription {
  kind: LineKind;
  /** Human label, e.g. 'Microstrip'. */
  label: string;
  description: string;
  /** Kind fields first (geometry…), then the common material and operating fields. */
  fields: readonly FieldDescription[];
  /** Methods offered through `spec.method`; the first is the default. */
  methods: readonly MethodOption[];
  /** Published validity ranges of the default method (dimensionless ratios). */
  validity: readonly ValidityRange[];
  /** Coupled kinds return zOdd, zEven, zDiff, zCommon. */
  isCoupled: boolean;
}

function describe(model: AnyLineModel): LineKindDescription {
  const { kind, label, description, fields, methods, validity, isCoupled, materialDefaults = {} } = model;
  const common = commonFields.map((field) => (field.name in materialDefaults ? { ...field, defaultValue: materialDefaults[field.name] } : field));
  return { kind, label, description, fields: [...fields, ...common], methods, validity, isCoupled };
}

/** Every kind, in menu order, as plain data. */
export const lineKinds: readonly LineKindDescription[] = Object.values(models).map((model) => describe(model as AnyLineModel));

const byKind = new Map<string, LineKindDescription>(lineKinds.map((entry) => [entry.kind, entry]));

/** The description of one kind; throws LineInputError('kind') for an unknown kind. */
export function lineKind(kind: string): LineKindDescription {
  const entry = byKind.get(kind);
  if (!entry) throw new LineInputError('kind', `must be one of ${lineKinds.map((k) => k.kind).join(', ')}`);
  return entry;
}

/** The fields of one kind (kind fields, then common fields), for building a form. */
export function kindFields(kind: LineKind): readonly FieldDescription[] {
  return lineKind(kind).fields;
}

/** The human label of one kind, e.g. 'Coplanar waveguide'. */
export function kindLabel(kind: LineKind): string {
  return lineKind(kind).label;
}

/** The model computing `kind`; throws LineInputError('kind') for an unknown kind. */
export function lineModel<S extends LineSpec>(kind: S['kind']): LineModel<S> {
  // Own properties only: a kind such as 'toString' must be refused, not found on Object.prototype.
  if (typeof kind !== 'string' || !Object.hasOwn(models, kind)) lineKind(String(kind));
  return (models as Record<string, unknown>)[kind] as LineModel<S>;
}
