/** Dielectric materials: Dk and Df at a reference frequency, optional Dk/Df table, strength, notes. */
import type { Knex } from 'knex';
import { LineInputError } from '@linewright/lines';
import type { AuditLog } from '../catalog/audit-log';
import { Catalog, type Dependents } from '../catalog/catalog-service';
import { siValue } from '../calculation/spec-units';
import type { DkDfPoint, Material, MaterialValues, MaterialsRepository } from './materials-repository';

type Quantity = number | string;

/** A material as a request sends it: frequencies and strength may be unit strings. */
export interface MaterialInput {
  name: string;
  description?: string | null;
  dk: number;
  df?: number;
  referenceFrequency?: Quantity;
  dkDfTable?: { frequency: Quantity; dk: number; df: number }[] | null;
  dielectricStrength?: Quantity | null;
  notes?: string | null;
}

const DEFAULT_REFERENCE_FREQUENCY = 1e9;
/** Beyond 1 THz no closed-form board model applies; a larger value is a typo. */
const MAX_FREQUENCY = 1e12;


function frequencyAt(value: Quantity, field: string): number {
  const frequency = siValue(value, 'frequency', field);
  if (!(frequency > 0 && frequency <= MAX_FREQUENCY)) throw new LineInputError(field, `must be a frequency above 0 and at most ${MAX_FREQUENCY} Hz`);
  return frequency;
}

function tableAt(points: NonNullable<MaterialInput['dkDfTable']>, path: string): DkDfPoint[] {
  const table = points.map((point, index) => ({ frequency: frequencyAt(point.frequency, `${path}[${index}].frequency`), dk: point.dk, df: point.df }));
  for (let index = 1; index < table.length; index++) {
    if (table[index].frequency <= table[index - 1].frequency) throw new LineInputError(`${path}[${index}].frequency`, 'must be higher than the row before');
  }
  return table;
}

/**
 * Checks and converts a material input to stored SI values; `path` prefixes
 * field names (e.g. 'rows[3].' for a CSV row). Ranges the schema cannot say
 * (after unit conversion) are checked here.
 */
export function materialValues(input: Partial<MaterialInput>, path = ''): Partial<MaterialValues> {
  const values: Partial<MaterialValues> = {};
  if (input.name !== undefined) values.name = input.name.trim();
  if (input.description !== undefined) values.description = input.description;
  if (input.notes !== undefined) values.notes = input.notes;
  if (input.dk !== undefined) values.dk = input.dk;
  if (input.df !== undefined) values.df = input.df;
  if (input.referenceFrequency !== undefined) values.referenceFrequency = frequencyAt(input.referenceFrequency, `${path}referenceFrequency`);
  if (input.dkDfTable !== undefined) values.dkDfTable = input.dkDfTable && tableAt(input.dkDfTable, `${path}dkDfTable`);
  if (input.dielectricStrength !== undefined) {
    const field = `${path}dielectricStrength`;
    const strength = input.dielectricStrength === null ? null : siValue(input.dielectricStrength, 'electricField', field);
    if (strength !== null && !(strength > 0)) throw new LineInputError(field, 'must be greater than 0');
    values.dielectricStrength = strength;
  }
  return values;
}

export class MaterialCatalog extends Catalog<Material, MaterialInput, MaterialValues> {
  constructor(
    db: Knex,
    readonly materials: MaterialsRepository,
    audit: AuditLog,
    dependents: Dependents | Dependents[],
  ) {
    super(db, materials, audit, 'material', dependents);
  }

  protected override async prepare(input: Partial<MaterialInput>, existing: Material | undefined): Promise<Partial<MaterialValues>> {
    const values = materialValues(input);
    if (!existing) return { description: null, df: 0, referenceFrequency: DEFAULT_REFERENCE_FREQUENCY, dkDfTable: null, dielectricStrength: null, notes: null, isTypical: false, ...values };
    return values;
  }


  /** Inserts prepared materials all together or not at all, each with its audit row. */
  async createAll(actor: { userId: number; role: 'admin' | 'engineer' | 'viewer' }, all: MaterialValues[]): Promise<Material[]> {
    return this.db.transaction(async (trx) => {
      const created: Material[] = [];
      for (const values of all) created.push(await this.insertAudited(actor, values, trx, 'import'));
      return created;
    });
  }
}
