/**
 * Line types: named, approved geometries ("50 Ω outer-layer microstrip").
 * The geometry is stored in SI; Dk, Df and the reference frequency come from
 * the referenced material, conductivity and roughness from the conductor, so
 * a line type is always computed with the catalog's current data.
 */
import type { Knex } from 'knex';
import type { ValidateFunction } from 'ajv';
import { ESTIMATE_NOTE, LineInputError, calculate, type LineResult, type LineSpec } from '@linewright/lines';
import { fieldProblems } from '../api-contract';
import { Problem } from '../errors';
import type { Actor } from '../auth/principal';
import type { AuditLog } from '../catalog/audit-log';
import { Catalog } from '../catalog/catalog-service';
import type { CatalogState } from '../catalog/catalog-states';
import { siValue, specToSi, withFieldPath } from '../calculation/spec-units';
import type { Conductor, ConductorsRepository } from '../conductors/conductors-repository';
import type { Material, MaterialsRepository } from '../materials/materials-repository';
import type { LineTarget, LineType, LineTypeValues, LineTypesRepository } from './line-types-repository';

type Quantity = number | string;

export interface LineTypeInput {
  name: string;
  description?: string | null;
  kind: LineSpec['kind'];
  geometry: Record<string, Quantity | boolean>;
  materialId: number;
  conductorId?: number | null;
  target: LineTarget;
  lengthDefault?: Quantity | null;
  tags?: string[];
}

/** Inputs that belong to the material, the conductor or the use, never to the geometry. */
const NOT_GEOMETRY = ['er', 'tanDelta', 'frequency', 'dielectricReferenceFrequency', 'conductivity', 'roughness', 'length'];

export interface LineTypeComputation {
  spec: LineSpec;
  result: LineResult;
  note: string;
  target: LineTarget & { actual: number; deviationPercent: number; isMet: boolean };
}

export class LineTypeCatalog extends Catalog<LineType, LineTypeInput, LineTypeValues> {
  constructor(
    db: Knex,
    private readonly lineTypes: LineTypesRepository,
    audit: AuditLog,
    private readonly materials: MaterialsRepository,
    private readonly conductors: ConductorsRepository,
    private readonly lineSpecSchema: ValidateFunction,
  ) {
    super(db, lineTypes, audit, 'line type');
  }

  /** The line type's full spec and its computed result, checked against its target. */
  async computed(record: LineType): Promise<LineTypeComputation> {
    const material = await this.materials.findById(record.materialId);
    const conductor = record.conductorId === null ? undefined : await this.conductors.findById(record.conductorId);
    return computeLineType(record, material!, conductor);
  }

  override async present(record: LineType): Promise<object> {
    return { ...record, computed: await this.computed(record) };
  }

  protected override async prepare(input: Partial<LineTypeInput>, existing: LineType | undefined, actor: Actor): Promise<Partial<LineTypeValues>> {
    const values: Partial<LineTypeValues> = {};
    if (input.name !== undefined) values.name = input.name.trim();
    if (input.description !== undefined) values.description = input.description;
    if (input.tags !== undefined) values.tags = [...new Set(input.tags.map((tag) => tag.trim()))];
    if (input.target !== undefined) values.target = input.target;
    if (input.materialId !== undefined) values.materialId = input.materialId;
    if (input.conductorId !== undefined) values.conductorId = input.conductorId;
    if (input.lengthDefault !== undefined) {
      values.lengthDefault = input.lengthDefault === null ? null : siValue(input.lengthDefault, 'length', 'lengthDefault');
    }
    if (input.kind !== undefined || input.geometry !== undefined) {
      const kind = input.kind ?? existing!.kind;
      if (!input.geometry) throw Problem.badRequest('A new kind needs its geometry.', [{ field: 'geometry', detail: 'is required when kind changes' }]);
      values.kind = kind;
      values.geometry = this.geometryOf(kind, input.geometry);
    }
    const merged = { description: null, conductorId: null, lengthDefault: null, tags: [], ...existing, ...values } as LineType;
    const material = await this.materials.findById(merged.materialId);
    if (!material || material.state === 'retired') throw Problem.badRequest('The material does not exist or is retired.', [{ field: 'materialId', detail: 'must name a material that is not retired' }]);
    const conductor = merged.conductorId === null ? undefined : await this.conductors.findById(merged.conductorId);
    if (merged.conductorId !== null && (!conductor || conductor.state === 'retired')) {
      throw Problem.badRequest('The conductor does not exist or is retired.', [{ field: 'conductorId', detail: 'must name a conductor that is not retired' }]);
    }
    // The line must compute with its material and meet the library's checks before it is stored.
    computeLineType(merged, material, conductor);
    return existing ? values : { description: null, conductorId: null, lengthDefault: null, tags: [], ownerId: actor.userId, ...values };
  }

  /** Approval needs approved references; proposing needs references that are not retired. */
  protected override async beforeTransition(record: LineType, to: CatalogState): Promise<void> {
    if (to !== 'approved' && to !== 'proposed') return;
    const material = await this.materials.findById(record.materialId);
    const conductor = record.conductorId === null ? undefined : await this.conductors.findById(record.conductorId);
    for (const [field, entry] of [['materialId', material], ['conductorId', conductor]] as const) {
      if (!entry) continue;
      const isReady = to === 'approved' ? entry.state === 'approved' : entry.state !== 'retired';
      if (!isReady) throw Problem.conflict(`Its ${field === 'materialId' ? 'material' : 'conductor'} "${entry.name}" is ${entry.state}; a line type can be ${to} only with ${to === 'approved' ? 'approved' : 'live'} references.`);
    }
  }

  private geometryOf(kind: LineSpec['kind'], geometry: Record<string, Quantity | boolean>): LineTypeValues['geometry'] {
    const foreign = Object.keys(geometry).filter((name) => NOT_GEOMETRY.includes(name));
    if (foreign.length > 0) {
      throw Problem.badRequest(
        'Dielectric, conductor and operating values come from the material, the conductor and the line type, not the geometry.',
        foreign.map((name) => ({ field: `geometry.${name}`, detail: 'belongs to the material, conductor or lengthDefault' })),
      );
    }
    // The LineSpec schema (with a placeholder er) names missing, unknown and mistyped geometry fields.
    const candidate = { kind, ...geometry, er: 1 };
    if (!this.lineSpecSchema(candidate)) {
      throw Problem.badRequest('The geometry does not match its kind.', fieldProblems(this.lineSpecSchema.errors, 'geometry'));
    }
    const { kind: _kind, er: _er, ...si } = specToSi(candidate, 'geometry') as unknown as Record<string, number | boolean | string>;
    return si;
  }
}

/** The spec a line type stands for, from its geometry, material, conductor and default length. */
export function lineTypeSpec(record: Pick<LineType, 'kind' | 'geometry' | 'lengthDefault'>, material: Material, conductor: Conductor | undefined): LineSpec {
  return {
    kind: record.kind,
    ...record.geometry,
    er: material.dk,
    tanDelta: material.df,
    frequency: material.referenceFrequency,
    ...(conductor ? { conductivity: conductor.conductivity, roughness: conductor.roughness } : {}),
    ...(record.lengthDefault !== null ? { length: record.lengthDefault } : {}),
  } as LineSpec;
}

export function computeLineType(record: Pick<LineType, 'kind' | 'geometry' | 'lengthDefault' | 'target'>, material: Material, conductor: Conductor | undefined): LineTypeComputation {
  const spec = lineTypeSpec(record, material, conductor);
  const result = withFieldPath('geometry', () => calculate(spec));
  const actual = result[record.target.quantity];
  if (actual === undefined) throw new LineInputError('target.quantity', `${record.kind} has no ${record.target.quantity}; use z0 for a single line, zDiff for a pair`);
  const deviationPercent = ((actual - record.target.value) / record.target.value) * 100;
  return {
    spec,
    result,
    note: ESTIMATE_NOTE,
    target: { ...record.target, actual, deviationPercent, isMet: Math.abs(deviationPercent) <= record.target.tolerancePercent },
  };
}
