/**
 * Generic copper foils with typical values (common practice, no single source):
 * annealed copper's conductivity (IACS, 5.8e7 S/m) and RMS roughness classes
 * as usually quoted for standard, low-profile and very-low-profile foil.
 * Re-runnable: rows are matched by name and never duplicated or overwritten.
 */
import type { Knex } from 'knex';

/** 1 oz/ft² copper is 1.37 mil ≈ 34.8 µm thick (trade-sheet value). */
const ONE_OUNCE = 34.8e-6;

export const GENERIC_CONDUCTORS = [
  { name: 'Electrodeposited copper, standard profile', roughness: 2e-6, description: 'General-purpose ED foil.' },
  { name: 'Electrodeposited copper, low profile', roughness: 0.8e-6, description: 'Reverse-treated or low-profile foil for multi-gigabit links.' },
  { name: 'Rolled annealed copper', roughness: 0.3e-6, description: 'Smooth foil for flex and low-loss RF boards.' },
];

export async function seed(knex: Knex): Promise<void> {
  const admin = await knex('users').where({ email: 'admin@halden.test' }).first('id');
  for (const conductor of GENERIC_CONDUCTORS) {
    if (await knex('conductors').where({ name: conductor.name }).first()) continue;
    await knex('conductors').insert({
      ...conductor,
      conductivity: 5.8e7,
      foil_thicknesses: JSON.stringify([ONE_OUNCE / 2, ONE_OUNCE, 2 * ONE_OUNCE]),
      notes: 'Typical value; confirm with the fabricator.',
      state: 'approved',
      created_by: admin?.id ?? null,
      updated_by: admin?.id ?? null,
    });
  }
}
