/**
 * The shape every line kind implements, so a new kind is one file under kinds/
 * plus one entry in kinds/registry.ts. calculate() adds everything that is
 * common to all kinds (delay, L and C, losses, totals) around `compute`.
 */
import type { LineKind, LineResult, LineSpec, MethodInfo } from '../types';
import type { ValidityRange } from '../validation';

/** What a field holds, so forms pick the unit list and the API documents it. */
export type FieldQuantity =
  | 'length'
  | 'frequency'
  | 'relativePermittivity'
  | 'lossTangent'
  | 'conductivity'
  | 'perLength'
  | 'electricField'
  | 'dimensionless'
  | 'boolean';

/** One input of a line kind, as a form or API document shows it. All numbers SI. */
export interface FieldDescription {
  /** The spec property, e.g. 'w'. */
  name: string;
  /** Short human label, e.g. 'Strip width'. */
  label: string;
  /** One sentence for tooltips and API docs. */
  description: string;
  quantity: FieldQuantity;
  /** True when the value is a length (metres), so the form offers mm/mil/µm/oz. */
  isLength: boolean;
  /** True when the spec may omit the field. */
  isOptional: boolean;
  /** A sensible value for a typical board or cable, SI. */
  defaultValue: number | boolean;
  /** Hard lower limit (physical), SI; `minExclusive` says whether it is allowed itself. */
  min?: number;
  minExclusive?: boolean;
  /** Hard upper limit, SI, where one exists. */
  max?: number;
  /** Which part of the form the field belongs to. */
  group: 'geometry' | 'material' | 'operating';
}

/** A method a kind offers through `spec.method`; the first in a kind's list is the default. */
export interface MethodOption extends MethodInfo {
  id: string;
}

/** What a kind's model returns; calculate() derives the rest of LineResult from it. */
export interface ModelOutput {
  z0: number;
  erEff: number;
  /** Coupled kinds only. */
  zOdd?: number;
  zEven?: number;
  erEffOdd?: number;
  erEffEven?: number;
  method: MethodInfo;
  warnings: string[];
  /** Kind-specific outputs (e.g. coax cut-off and voltage rating). */
  extras?: Partial<LineResult>;
}

export interface LineModel<S extends LineSpec = LineSpec> {
  kind: S['kind'];
  /** Human label, e.g. 'Microstrip'. */
  label: string;
  /** One sentence describing the cross-section. */
  description: string;
  /** Kind-specific fields (geometry and any extra inputs), in form order. */
  fields: readonly FieldDescription[];
  methods: readonly MethodOption[];
  /** Defaults of common fields that differ for this kind (e.g. polyethylene for coax). */
  materialDefaults?: Readonly<Record<string, number>>;
  /** Published validity ranges of the default method, for the form's hints. */
  validity: readonly ValidityRange[];
  /** True for kinds whose result has zOdd, zEven, zDiff… */
  isCoupled: boolean;
  /** Throws LineInputError for impossible geometry (common fields are checked before). */
  validate(spec: S): void;
  /**
   * Quasi-static (and, where the method has it, dispersive at `spec.frequency`)
   * impedance and effective permittivity. `spec.er` is already the permittivity
   * at the frequency when a wideband dielectric model applies.
   */
  compute(spec: S): ModelOutput;
  /**
   * The same line with every conductor surface moved `recession` metres into
   * its metal (strips thinner and narrower, planes farther), for Wheeler's
   * incremental-inductance rule of conductor loss.
   */
  recede(spec: S, recession: number): S;
}

/** A model for any kind, as the registry holds it. */
export type AnyLineModel = { [K in LineKind]: LineModel<Extract<LineSpec, { kind: K }>> }[LineKind];

/** The method `id` names, or the kind's default (first) when `id` is omitted; validateSpec has already rejected unknown ids. */
export function chooseMethod(methods: readonly MethodOption[], id: string | undefined): MethodOption {
  return methods.find((method) => method.id === id) ?? methods[0];
}
