/**
 * Generic dielectric classes with typical handbook values (marked typical: real
 * laminates vary by resin content, glass style and supplier; use the
 * fabricator's data for a real design). No brand or trade names.
 * Values are typical figures as commonly quoted in handbooks and data sheets
 * (common practice, no single source); Dk/Df at 1 GHz unless noted.
 */
import type { Knex } from 'knex';

const GIGAHERTZ = 1e9;

export const GENERIC_MATERIALS = [
  {
    name: 'Glass-epoxy, FR-4 class',
    description: 'Woven glass reinforced epoxy laminate, general-purpose rigid boards.',
    dk: 4.3, df: 0.02, dielectric_strength: 20e6,
    dk_df_table: [
      { frequency: 1e6, dk: 4.6, df: 0.017 },
      { frequency: 1e9, dk: 4.3, df: 0.02 },
      { frequency: 1e10, dk: 4.1, df: 0.022 },
    ],
  },
  {
    name: 'Glass-epoxy, low-loss class',
    description: 'Modified epoxy or blended resin system for multi-gigabit links.',
    dk: 3.7, df: 0.008, dielectric_strength: 30e6, dk_df_table: null,
  },
  {
    name: 'PTFE, woven glass',
    description: 'Glass-reinforced polytetrafluoroethylene laminate for RF boards.',
    dk: 2.55, df: 0.0015, dielectric_strength: 30e6, dk_df_table: null,
  },
  {
    name: 'Solid polyethylene',
    description: 'Cable insulation; solid-dielectric coax and twin lead.',
    dk: 2.25, df: 0.0002, dielectric_strength: 20e6, dk_df_table: null,
  },
  {
    name: 'Polyimide film',
    description: 'Flexible circuits and coverlay.',
    dk: 3.4, df: 0.004, dielectric_strength: 150e6, dk_df_table: null,
  },
  {
    name: 'Liquid solder mask',
    description: 'Coating over outer-layer copper; thickness varies over and between traces.',
    dk: 3.5, df: 0.025, dielectric_strength: 30e6, dk_df_table: null,
  },
];

export async function seed(knex: Knex): Promise<void> {
  const admin = await knex('users').where({ email: 'admin@halden.test' }).first('id');
  for (const material of GENERIC_MATERIALS) {
    const existing = await knex('materials').where({ name: material.name }).first();
    if (existing) continue;
    await knex('materials').insert({
      ...material,
      dk_df_table: material.dk_df_table ? JSON.stringify(material.dk_df_table) : null,
      reference_frequency: GIGAHERTZ,
      is_typical: true,
      notes: 'Typical handbook value; confirm with the laminate data sheet and the fabricator.',
      state: 'approved',
      created_by: admin?.id ?? null,
      updated_by: admin?.id ?? null,
    });
  }
}
