/** The `stackups` table, described once for the shared catalog repository. */
import type { Knex } from 'knex';
import type { CopperRole, DielectricKind, LineStructure } from '@linewright/lines';
import { CatalogRepository, type CatalogRecord, type CatalogTable, type Row } from '../catalog/catalog-repository';

export interface StoredCopperLayer {
  type: 'copper';
  name: string;
  /** [m] */
  thickness: number;
  role: CopperRole;
  conductorId: number | null;
}

/** Dk and Df come from the material unless given here (a fabricator's figure for this glass style overrides it). */
export interface StoredDielectricLayer {
  type: 'dielectric';
  name: string;
  /** [m] */
  thickness: number;
  kind: DielectricKind;
  materialId: number | null;
  relativePermittivity: number | null;
  lossTangent: number | null;
}

export type StoredLayer = StoredCopperLayer | StoredDielectricLayer;

/** A line on a layer. With a line type, the target comes from it; width and gap start from its geometry. */
export interface StoredPlacement {
  /** Stable within the stackup, e.g. 'p3f9a1c2'. */
  id: string;
  label: string;
  lineTypeId: number | null;
  layerIndex: number;
  structure: LineStructure;
  /** [Ω] z0, or zDiff for a pair. */
  targetImpedance: number;
  tolerancePercent: number;
  /** [m] */
  width: number;
  /** [m] */
  gap: number | null;
}

export interface StackupValues {
  name: string;
  description: string | null;
  layers: StoredLayer[];
  placements: StoredPlacement[];
  ownerId: number | null;
}

export type StackupRecord = CatalogRecord & StackupValues;

const parsed = <T>(value: unknown): T => (typeof value === 'string' ? JSON.parse(value) : value) as T;

export const STACKUPS_TABLE: CatalogTable<StackupRecord, StackupValues> = {
  table: 'stackups',
  fromRow: (row: Row) => ({
    description: row['description'] as string | null,
    layers: parsed(row['layers']),
    placements: parsed(row['placements']),
    ownerId: row['owner_id'] as number | null,
  }),
  toRow: (values) => {
    const row: Row = {};
    if (values.name !== undefined) row['name'] = values.name;
    if (values.description !== undefined) row['description'] = values.description;
    if (values.layers !== undefined) row['layers'] = JSON.stringify(values.layers);
    if (values.placements !== undefined) row['placements'] = JSON.stringify(values.placements);
    if (values.ownerId !== undefined) row['owner_id'] = values.ownerId;
    return row;
  },
  sortColumns: { name: 'name', updatedAt: 'updated_at', createdAt: 'created_at' },
};

export class StackupsRepository extends CatalogRepository<StackupRecord, StackupValues> {
  constructor(private readonly knex: Knex) {
    super(knex, STACKUPS_TABLE);
  }

  /** How many stackups refer to a material, conductor or line type (its id inside the layers or placements JSON). */
  async countUsing(reference: 'materialId' | 'conductorId' | 'lineTypeId', id: number): Promise<number> {
    const column = reference === 'lineTypeId' ? 'placements' : 'layers';
    const [{ total }] = await this.knex('stackups').whereRaw(`JSON_CONTAINS(${column}, JSON_OBJECT(?, ?))`, [reference, id]).count({ total: '*' });
    return Number(total);
  }
}
