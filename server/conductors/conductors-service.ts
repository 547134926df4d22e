/** Conductors: conductivity, RMS surface roughness and the foil thicknesses on offer. */
import type { Knex } from 'knex';
import { LineInputError } from '@linewright/lines';
import type { AuditLog } from '../catalog/audit-log';
import { Catalog, type Dependents } from '../catalog/catalog-service';
import { siValue } from '../calculation/spec-units';
import type { Conductor, ConductorValues, ConductorsRepository } from './conductors-repository';

type Quantity = number | string;

/** A conductor as a request sends it: lengths may be unit strings ("1 oz", "2 um"). */
export interface ConductorInput {
  name: string;
  description?: string | null;
  conductivity: Quantity;
  roughness?: Quantity;
  foilThicknesses: Quantity[];
  notes?: string | null;
}

/** Above silver's ≈6.3e7 S/m no conductor exists at room temperature; a larger value is a typo (common practice, no source). */
const MAX_CONDUCTIVITY = 1e8;
/** A foil or roughness over a millimetre is not a board conductor. */
const MAX_LENGTH = 1e-3;

function lengthAt(value: Quantity, field: string, allowZero: boolean): number {
  const length = siValue(value, 'length', field);
  if (!(allowZero ? length >= 0 : length > 0) || length > MAX_LENGTH) {
    throw new LineInputError(field, `must be ${allowZero ? 'at least 0' : 'above 0'} and at most 1 mm`);
  }
  return length;
}


export class ConductorCatalog extends Catalog<Conductor, ConductorInput, ConductorValues> {
  constructor(
    db: Knex,
    conductors: ConductorsRepository,
    audit: AuditLog,
    dependents: Dependents | Dependents[],
  ) {
    super(db, conductors, audit, 'conductor', dependents);
  }

  protected override async prepare(input: Partial<ConductorInput>, existing: Conductor | undefined): Promise<Partial<ConductorValues>> {
    const values: Partial<ConductorValues> = {};
    if (input.name !== undefined) values.name = input.name.trim();
    if (input.description !== undefined) values.description = input.description;
    if (input.notes !== undefined) values.notes = input.notes;
    if (input.conductivity !== undefined) {
      const conductivity = siValue(input.conductivity, 'conductivity', 'conductivity');
      if (!(conductivity > 0 && conductivity <= MAX_CONDUCTIVITY)) throw new LineInputError('conductivity', `must be above 0 and at most ${MAX_CONDUCTIVITY} S/m`);
      values.conductivity = conductivity;
    }
    if (input.roughness !== undefined) values.roughness = lengthAt(input.roughness, 'roughness', true);
    if (input.foilThicknesses !== undefined) {
      values.foilThicknesses = input.foilThicknesses.map((value, index) => lengthAt(value, `foilThicknesses[${index}]`, false));
    }
    return existing ? values : { description: null, notes: null, roughness: 0, ...values };
  }

}
