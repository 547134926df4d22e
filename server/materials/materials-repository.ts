/** The `materials` table, described once for the shared catalog repository. */
import type { Knex } from 'knex';
import { CatalogRepository, type CatalogRecord, type CatalogTable, type Row } from '../catalog/catalog-repository';

export interface DkDfPoint {
  /** [Hz] */
  frequency: number;
  dk: number;
  df: number;
}

/** What is stored for a material, SI. */
export interface MaterialValues {
  name: string;
  description: string | null;
  dk: number;
  df: number;
  /** Frequency at which dk and df hold [Hz]. */
  referenceFrequency: number;
  dkDfTable: DkDfPoint[] | null;
  /** [V/m] */
  dielectricStrength: number | null;
  notes: string | null;
  isTypical: boolean;
}

export type Material = CatalogRecord & MaterialValues;

const parsed = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : (value ?? null));

const COLUMNS: Record<keyof MaterialValues, string> = {
  name: 'name',
  description: 'description',
  dk: 'dk',
  df: 'df',
  referenceFrequency: 'reference_frequency',
  dkDfTable: 'dk_df_table',
  dielectricStrength: 'dielectric_strength',
  notes: 'notes',
  isTypical: 'is_typical',
};

export const MATERIALS_TABLE: CatalogTable<Material, MaterialValues> = {
  table: 'materials',
  fromRow: (row: Row) => ({
    description: row['description'] as string | null,
    dk: row['dk'] as number,
    df: row['df'] as number,
    referenceFrequency: row['reference_frequency'] as number,
    dkDfTable: parsed(row['dk_df_table']),
    dielectricStrength: row['dielectric_strength'] as number | null,
    notes: row['notes'] as string | null,
    isTypical: Boolean(row['is_typical']),
  }),
  toRow: (values) => {
    const row: Row = {};
    for (const [key, column] of Object.entries(COLUMNS) as [keyof MaterialValues, string][]) {
      if (values[key] === undefined) continue;
      row[column] = key === 'dkDfTable' ? (values.dkDfTable ? JSON.stringify(values.dkDfTable) : null) : values[key];
    }
    return row;
  },
  sortColumns: { name: 'name', dk: 'dk', df: 'df', updatedAt: 'updated_at', createdAt: 'created_at' },
};

export class MaterialsRepository extends CatalogRepository<Material, MaterialValues> {
  constructor(private readonly knex: Knex) {
    super(knex, MATERIALS_TABLE);
  }

  async names(): Promise<string[]> {
    const rows = await this.knex('materials').select('name');
    return rows.map((row: { name: string }) => row.name);
  }
}
