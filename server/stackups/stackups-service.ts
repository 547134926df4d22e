/**
 * Stackups in the team catalog: the same life cycle, versions and audit as
 * materials and line types. A stackup is created from its layers, from a
 * template (2, 4, 6, 8 layers) or as a copy; Dk and Df of a dielectric come
 * from its catalog material unless the layer overrides them. Lines placed on
 * the layers carry their targets; the impedance table is computed from the
 * stack with the shared library every time it is read.
 */
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import { LineInputError, lineGeometryFor, solveLineDimension, stackupTemplate, validateStackup, type Stackup } from '@linewright/lines';
import { Problem } from '../errors';
import type { Actor } from '../auth/principal';
import type { AuditLog } from '../catalog/audit-log';
import { Catalog, type Dependents } from '../catalog/catalog-service';
import { siValue } from '../calculation/spec-units';
import type { ConductorsRepository } from '../conductors/conductors-repository';
import type { LineTypesRepository } from '../line-types/line-types-repository';
import type { MaterialsRepository } from '../materials/materials-repository';
import type { StackupRecord, StackupValues, StackupsRepository, StoredLayer, StoredPlacement } from './stackups-repository';
import { stackupTable, type StackupTable } from './stackup-table';

type Quantity = number | string;

export type LayerInput =
  | { type: 'copper'; name: string; thickness: Quantity; role: 'signal' | 'plane' | 'mixed'; conductorId?: number | null }
  | { type: 'dielectric'; name: string; thickness: Quantity; kind: 'core' | 'prepreg' | 'coating'; materialId?: number | null; relativePermittivity?: number | null; lossTangent?: number | null };

export interface PlacementInput {
  id?: string;
  label: string;
  lineTypeId?: number | null;
  layerIndex: number;
  structure?: 'single' | 'pair';
  targetImpedance?: number;
  tolerancePercent?: number;
  width?: Quantity;
  gap?: Quantity | null;
}

export interface StackupInput {
  name: string;
  description?: string | null;
  layers?: LayerInput[];
  template?: number;
  copyOf?: number;
  placements?: PlacementInput[];
}

/** The stack as the library computes it, with the catalog names for labels. */
export interface ResolvedStackup {
  stackup: Stackup;
  materialNames: (string | null)[];
}

const DEFAULT_TOLERANCE_PERCENT = 10;
/** A layer over 10 mm or a line over 100 mm wide is a typo, not a board (common practice, no source). */
const MAX_THICKNESS = 10e-3;
const MAX_WIDTH = 0.1;

export class StackupCatalog extends Catalog<StackupRecord, StackupInput, StackupValues> {
  constructor(
    db: Knex,
    readonly stackups: StackupsRepository,
    audit: AuditLog,
    private readonly materials: MaterialsRepository,
    private readonly conductors: ConductorsRepository,
    private readonly lineTypes: LineTypesRepository,
    dependents?: Dependents,
  ) {
    super(db, stackups, audit, 'stackup', dependents);
  }

  /** The library's Stackup for a record, Dk/Df resolved from the materials. */
  async resolve(record: Pick<StackupValues, 'layers'>): Promise<ResolvedStackup> {
    const ids = record.layers.flatMap((layer) => (layer.type === 'dielectric' && layer.materialId !== null ? [layer.materialId] : []));
    const materials = new Map((await this.materials.findByIds([...new Set(ids)])).map((material) => [material.id, material]));
    const materialNames: (string | null)[] = [];
    const layers = record.layers.map((layer, index): Stackup['layers'][number] => {
      if (layer.type === 'copper') {
        materialNames.push(null);
        return { type: 'copper', name: layer.name, thickness: layer.thickness, role: layer.role };
      }
      const material = layer.materialId === null ? undefined : materials.get(layer.materialId);
      const relativePermittivity = layer.relativePermittivity ?? material?.dk;
      const lossTangent = layer.lossTangent ?? material?.df ?? 0;
      if (relativePermittivity === undefined) throw new LineInputError(`layers[${index}].relativePermittivity`, 'is required when the layer has no material');
      materialNames.push(material?.name ?? null);
      return { type: 'dielectric', name: layer.name, thickness: layer.thickness, kind: layer.kind, relativePermittivity, lossTangent, ...(material ? { material: material.name } : {}) };
    });
    return { stackup: { layers }, materialNames };
  }

  override async present(record: StackupRecord): Promise<object> {
    const { stackup } = await this.resolve(record);
    return { ...record, resolvedLayers: stackup.layers };
  }

  /** The impedance table, computed now from the stack and the catalog's current Dk/Df. */
  async table(record: StackupRecord): Promise<StackupTable> {
    return stackupTable(record, await this.resolve(record));
  }

  /** Writes the placements `change` makes of the current ones (a new version, audited like any edit). */
  async writePlacements(actor: Actor, id: number, version: number, change: (placements: StoredPlacement[]) => PlacementInput[]): Promise<StackupRecord> {
    const record = await this.get(id);
    return this.update(actor, id, version, { placements: change(record.placements.map((placement) => ({ ...placement }))) });
  }

  /** Solves a placement's width (or a pair's gap) for its target on this stack and stores it. */
  async solvePlacement(actor: Actor, id: number, version: number, placementId: string, unknown: 'width' | 'gap'): Promise<StackupRecord> {
    const record = await this.get(id);
    const placement = record.placements.find((entry) => entry.id === placementId);
    if (!placement) throw Problem.notFound(`No placement ${placementId} on this stackup.`);
    if (unknown === 'gap' && placement.structure !== 'pair') throw Problem.badRequest('Only a pair has a gap to solve.', [{ field: 'unknown', detail: 'gap applies to pairs only' }]);
    const { stackup } = await this.resolve(record);
    const solved = solveLineDimension(stackup, placement.layerIndex, placement.structure, placement.targetImpedance, { width: placement.width, gap: placement.gap ?? undefined }, unknown);
    return this.writePlacements(actor, id, version, (placements) =>
      placements.map((entry) => (entry.id === placementId ? { ...entry, width: solved.dimensions.width, gap: solved.dimensions.gap ?? null } : entry)),
    );
  }

  protected override async prepare(input: Partial<StackupInput>, existing: StackupRecord | undefined, actor: Actor): Promise<Partial<StackupValues>> {
    const values: Partial<StackupValues> = {};
    if (input.name !== undefined) values.name = input.name.trim();
    if (input.description !== undefined) values.description = input.description;
    const sources = (['layers', 'template', 'copyOf'] as const).filter((source) => input[source] !== undefined);
    if (!existing && sources.length !== 1) {
      throw Problem.badRequest('A new stackup needs exactly one of layers, template and copyOf.', [{ field: sources[1] ?? 'layers', detail: 'give exactly one of layers, template, copyOf' }]);
    }
    if (existing && (input.template !== undefined || input.copyOf !== undefined)) {
      throw Problem.badRequest('template and copyOf only apply when creating.', [{ field: input.template !== undefined ? 'template' : 'copyOf', detail: 'only applies when creating' }]);
    }
    if (input.layers !== undefined) values.layers = await this.layersOf(input.layers);
    if (input.template !== undefined) values.layers = templateLayers(input.template);
    if (input.copyOf !== undefined) {
      const original = await this.get(input.copyOf);
      values.layers = original.layers;
      values.placements = original.placements;
      values.description ??= original.description;
    }
    const layers = values.layers ?? existing!.layers;
    const resolved = await this.resolve({ layers });
    validateStackup(resolved.stackup);
    if (input.placements !== undefined) values.placements = await this.placementsOf(input.placements);
    const placements = values.placements ?? existing?.placements ?? [];
    placements.forEach((placement, index) => checkPlacement(resolved.stackup, placement, index));
    return existing ? values : { description: null, placements: [], ownerId: actor.userId, ...values };
  }

  private async layersOf(inputs: LayerInput[]): Promise<StoredLayer[]> {
    const layers: StoredLayer[] = [];
    for (const [index, input] of inputs.entries()) {
      const thickness = lengthOf(input.thickness, `layers[${index}].thickness`, MAX_THICKNESS);
      if (input.type === 'copper') {
        const conductorId = input.conductorId ?? null;
        if (conductorId !== null) await this.requireLive(this.conductors, conductorId, `layers[${index}].conductorId`, 'conductor');
        layers.push({ type: 'copper', name: input.name.trim(), thickness, role: input.role, conductorId });
        continue;
      }
      const materialId = input.materialId ?? null;
      if (materialId !== null) await this.requireLive(this.materials, materialId, `layers[${index}].materialId`, 'material');
      layers.push({
        type: 'dielectric',
        name: input.name.trim(),
        thickness,
        kind: input.kind,
        materialId,
        relativePermittivity: input.relativePermittivity ?? null,
        lossTangent: input.lossTangent ?? null,
      });
    }
    return layers;
  }

  private async placementsOf(inputs: PlacementInput[]): Promise<StoredPlacement[]> {
    const placements: StoredPlacement[] = [];
    for (const [index, input] of inputs.entries()) {
      const path = `placements[${index}]`;
      const lineType = input.lineTypeId ? await this.lineTypes.findById(input.lineTypeId) : undefined;
      if (input.lineTypeId && (!lineType || lineType.state === 'retired')) {
        throw Problem.badRequest('The line type does not exist or is retired.', [{ field: `${path}.lineTypeId`, detail: 'must name a line type that is not retired' }]);
      }
      const structure = input.structure ?? (lineType ? (lineType.target.quantity === 'zDiff' ? 'pair' : 'single') : undefined);
      const targetImpedance = input.targetImpedance ?? lineType?.target.value;
      const widthInput = input.width ?? (lineType?.geometry['w'] as number | undefined);
      const gapInput = input.gap ?? (lineType?.geometry['s'] as number | undefined) ?? null;
      for (const [field, value] of [['structure', structure], ['targetImpedance', targetImpedance], ['width', widthInput]] as const) {
        if (value === undefined) throw Problem.badRequest(`A placement without a line type needs its ${field}.`, [{ field: `${path}.${field}`, detail: 'is required without lineTypeId' }]);
      }
      const width = lengthOf(widthInput!, `${path}.width`, MAX_WIDTH);
      const gap = structure === 'pair' ? lengthOf(gapInput ?? Number.NaN, `${path}.gap`, MAX_WIDTH) : null;
      placements.push({
        id: input.id ?? `p${randomUUID().slice(0, 8)}`,
        label: input.label.trim(),
        lineTypeId: lineType?.id ?? null,
        layerIndex: input.layerIndex,
        structure: structure!,
        targetImpedance: targetImpedance!,
        tolerancePercent: input.tolerancePercent ?? lineType?.target.tolerancePercent ?? DEFAULT_TOLERANCE_PERCENT,
        width,
        gap,
      });
    }
    const labels = new Map<string, number>();
    placements.forEach((placement, index) => {
      const key = placement.label.toLowerCase();
      if (labels.has(key)) throw Problem.badRequest('Every placement needs its own label.', [{ field: `placements[${index}].label`, detail: `repeats placements[${labels.get(key)}]` }]);
      labels.set(key, index);
    });
    return placements;
  }

  private async requireLive(repository: { findById(id: number): Promise<{ state: string } | undefined> }, id: number, field: string, noun: string): Promise<void> {
    const entry = await repository.findById(id);
    if (!entry || entry.state === 'retired') throw Problem.badRequest(`The ${noun} does not exist or is retired.`, [{ field, detail: `must name a ${noun} that is not retired` }]);
  }
}

/** The library's template as stored layers, with its own Dk/Df (no catalog material). */
function templateLayers(layerCount: number): StoredLayer[] {
  const template = withField('template', () => stackupTemplate(layerCount));
  return template.layers.map((layer) =>
    layer.type === 'copper'
      ? { type: 'copper', name: layer.name, thickness: layer.thickness, role: layer.role, conductorId: null }
      : { type: 'dielectric', name: layer.name, thickness: layer.thickness, kind: layer.kind, materialId: null, relativePermittivity: layer.relativePermittivity, lossTangent: layer.lossTangent },
  );
}

/** Throws LineInputError naming `placements[i].…` unless the line can be derived from the stack. */
function checkPlacement(stackup: Stackup, placement: StoredPlacement, index: number): void {
  withField(`placements[${index}]`, () => lineGeometryFor(stackup, placement.layerIndex, placement.structure, { width: placement.width, gap: placement.gap ?? undefined }));
}

function lengthOf(value: Quantity, field: string, maximum: number): number {
  const length = siValue(value, 'length', field);
  if (!(length > 0 && length <= maximum)) throw new LineInputError(field, `must be above 0 and at most ${maximum * 1e3} mm`);
  return length;
}

/** Runs `compute`, renaming the library's field to its path in the request (`layerIndex` → `placements[2].layerIndex`). */
function withField<T>(path: string, compute: () => T): T {
  try {
    return compute();
  } catch (error) {
    // The library names its own argument; the client needs the request path.
    if (error instanceof LineInputError) throw new LineInputError(error.field === 'layerCount' ? path : `${path}.${error.field}`, error.rule);
    throw error;
  }
}
