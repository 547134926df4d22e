/** The `line_types` table, described once for the shared catalog repository. */
import type { Knex } from 'knex';
import type { LineKind } from '@linewright/lines';
import { CatalogRepository, type CatalogRecord, type CatalogTable, type Row } from '../catalog/catalog-repository';

export interface LineTarget {
  quantity: 'z0' | 'zDiff';
  /** [Ω] */
  value: number;
  /** ± tolerance [%]. */
  tolerancePercent: number;
}

/** What is stored for a line type, SI. */
export interface LineTypeValues {
  name: string;
  description: string | null;
  kind: LineKind;
  /** The kind's geometry fields (no material or operating fields), SI. */
  geometry: Record<string, number | boolean | string>;
  materialId: number;
  conductorId: number | null;
  target: LineTarget;
  /** [m] */
  lengthDefault: number | null;
  tags: string[];
  ownerId: number | null;
}

export type LineType = CatalogRecord & LineTypeValues;

const parsed = <T>(value: unknown): T => (typeof value === 'string' ? JSON.parse(value) : value) as T;

export const LINE_TYPES_TABLE: CatalogTable<LineType, LineTypeValues> = {
  table: 'line_types',
  fromRow: (row: Row) => ({
    description: row['description'] as string | null,
    kind: row['kind'] as LineKind,
    geometry: parsed(row['geometry']),
    materialId: row['material_id'] as number,
    conductorId: row['conductor_id'] as number | null,
    target: { quantity: row['target_quantity'] as LineTarget['quantity'], value: row['target_value'] as number, tolerancePercent: row['target_tolerance_percent'] as number },
    lengthDefault: row['length_default'] as number | null,
    tags: parsed(row['tags']),
    ownerId: row['owner_id'] as number | null,
  }),
  toRow: (values) => {
    const row: Row = {};
    if (values.name !== undefined) row['name'] = values.name;
    if (values.description !== undefined) row['description'] = values.description;
    if (values.kind !== undefined) row['kind'] = values.kind;
    if (values.geometry !== undefined) row['geometry'] = JSON.stringify(values.geometry);
    if (values.materialId !== undefined) row['material_id'] = values.materialId;
    if (values.conductorId !== undefined) row['conductor_id'] = values.conductorId;
    if (values.target !== undefined) {
      row['target_quantity'] = values.target.quantity;
      row['target_value'] = values.target.value;
      row['target_tolerance_percent'] = values.target.tolerancePercent;
    }
    if (values.lengthDefault !== undefined) row['length_default'] = values.lengthDefault;
    if (values.tags !== undefined) row['tags'] = JSON.stringify(values.tags);
    if (values.ownerId !== undefined) row['owner_id'] = values.ownerId;
    return row;
  },
  sortColumns: { name: 'name', kind: 'kind', target: 'target_value', updatedAt: 'updated_at', createdAt: 'created_at' },
  filters: {
    kind: (query, value) => void query.where('kind', value),
    tag: (query, value) => void query.whereRaw('JSON_CONTAINS(tags, JSON_QUOTE(?))', [value]),
    materialId: (query, value) => void query.where('material_id', Number(value)),
    conductorId: (query, value) => void query.where('conductor_id', Number(value)),
  },
};

export class LineTypesRepository extends CatalogRepository<LineType, LineTypeValues> {
  constructor(private readonly knex: Knex) {
    super(knex, LINE_TYPES_TABLE);
  }

  /** How many line types reference a material or a conductor. */
  async countUsing(column: 'material_id' | 'conductor_id', id: number): Promise<number> {
    const [{ total }] = await this.knex('line_types').where(column, id).count({ total: '*' });
    return Number(total);
  }
}
