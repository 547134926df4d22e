/** The `conductors` table, described once for the shared catalog repository. */
import type { Knex } from 'knex';
import { CatalogRepository, type CatalogRecord, type CatalogTable, type Row } from '../catalog/catalog-repository';

/** What is stored for a conductor, SI. */
export interface ConductorValues {
  name: string;
  description: string | null;
  /** [S/m] */
  conductivity: number;
  /** RMS surface roughness [m]. */
  roughness: number;
  /** Foil thickness options [m]. */
  foilThicknesses: number[];
  notes: string | null;
}

export type Conductor = CatalogRecord & ConductorValues;

export const CONDUCTORS_TABLE: CatalogTable<Conductor, ConductorValues> = {
  table: 'conductors',
  fromRow: (row: Row) => ({
    description: row['description'] as string | null,
    conductivity: row['conductivity'] as number,
    roughness: row['roughness'] as number,
    foilThicknesses: typeof row['foil_thicknesses'] === 'string' ? JSON.parse(row['foil_thicknesses']) : (row['foil_thicknesses'] as number[]),
    notes: row['notes'] as string | null,
  }),
  toRow: (values) => {
    const row: Row = {};
    if (values.name !== undefined) row['name'] = values.name;
    if (values.description !== undefined) row['description'] = values.description;
    if (values.conductivity !== undefined) row['conductivity'] = values.conductivity;
    if (values.roughness !== undefined) row['roughness'] = values.roughness;
    if (values.foilThicknesses !== undefined) row['foil_thicknesses'] = JSON.stringify(values.foilThicknesses);
    if (values.notes !== undefined) row['notes'] = values.notes;
    return row;
  },
  sortColumns: { name: 'name', conductivity: 'conductivity', updatedAt: 'updated_at', createdAt: 'created_at' },
};

export class ConductorsRepository extends CatalogRepository<Conductor, ConductorValues> {
  constructor(db: Knex) {
    super(db, CONDUCTORS_TABLE);
  }
}
