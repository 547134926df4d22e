/**
 * Halden Ridge Instruments' approved line types (invented demo data). The
 * geometries are starting points computed with the library, not a stackup
 * from any fabricator. Re-runnable: matched by name.
 */
import type { Knex } from 'knex';

const ONE_OUNCE = 34.8e-6;

const LINE_TYPES = [
  {
    name: '50 Ω outer-layer microstrip',
    kind: 'microstrip',
    geometry: { w: 0.3e-3, h: 0.17e-3, t: ONE_OUNCE },
    material: 'Glass-epoxy, FR-4 class',
    target: { quantity: 'z0', value: 50, tolerancePercent: 10 },
    tags: ['outer', 'single-ended'],
  },
  {
    name: '50 Ω inner-layer stripline',
    kind: 'stripline',
    geometry: { w: 0.2e-3, b: 0.5e-3, t: ONE_OUNCE / 2 },
    material: 'Glass-epoxy, FR-4 class',
    target: { quantity: 'z0', value: 50, tolerancePercent: 10 },
    tags: ['inner', 'single-ended'],
  },
  {
    name: '100 Ω outer-layer pair',
    kind: 'coupled-microstrip',
    geometry: { w: 0.15e-3, s: 0.115e-3, h: 0.1e-3, t: ONE_OUNCE },
    material: 'Glass-epoxy, low-loss class',
    target: { quantity: 'zDiff', value: 100, tolerancePercent: 10 },
    tags: ['outer', 'differential'],
  },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const admin = await knex('users').where({ email: 'admin@halden.test' }).first('id');
  const conductor = await knex('conductors').where({ name: 'Electrodeposited copper, standard profile' }).first('id');
  for (const lineType of LINE_TYPES) {
    if (await knex('line_types').where({ name: lineType.name }).first()) continue;
    const material = await knex('materials').where({ name: lineType.material }).first('id');
    if (!material) continue;
    await knex('line_types').insert({
      name: lineType.name,
      kind: lineType.kind,
      geometry: JSON.stringify(lineType.geometry),
      material_id: material.id,
      conductor_id: conductor?.id ?? null,
      target_quantity: lineType.target.quantity,
      target_value: lineType.target.value,
      target_tolerance_percent: lineType.target.tolerancePercent,
      length_default: 0.1,
      tags: JSON.stringify(lineType.tags),
      owner_id: admin?.id ?? null,
      state: 'approved',
      created_by: admin?.id ?? null,
      updated_by: admin?.id ?? null,
    });
  }
}
