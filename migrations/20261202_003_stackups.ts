/**
 * Stackups (a catalog entry like materials and line types: versioned, with
 * states), the read-only links they are shared by, and the files that come
 * back: the fabricator's reply and coupon measurements.
 */
import type { Knex } from 'knex';

const CATALOG_STATES = ['draft', 'proposed', 'approved', 'retired'];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stackups', (table) => {
    table.increments('id').primary();
    table.string('name', 120).notNullable().unique();
    table.text('description').nullable();
    // Ordered layers, top to bottom, SI, with material and conductor ids (see stackups-repository.ts).
    table.json('layers').notNullable();
    // Lines placed on the layers, with their targets (see stackups-repository.ts).
    table.json('placements').notNullable();
    table.integer('owner_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.enum('state', CATALOG_STATES).notNullable().defaultTo('draft');
    table.integer('version').unsigned().notNullable().defaultTo(1);
    table.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    table.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('stackup_shares', (table) => {
    table.increments('id').primary();
    table.integer('stackup_id').unsigned().notNullable().references('id').inTable('stackups').onDelete('CASCADE');
    table.integer('stackup_version').unsigned().notNullable();
    table.string('email', 254).notNullable();
    table.integer('shared_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.timestamp('expires_at').notNullable();
    table.timestamp('revoked_at').nullable();
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('stackup_uploads', (table) => {
    table.increments('id').primary();
    table.integer('stackup_id').unsigned().notNullable().references('id').inTable('stackups').onDelete('CASCADE');
    table.integer('stackup_version').unsigned().notNullable();
    table.enum('kind', ['fabricator-reply', 'coupon']).notNullable();
    table.string('file_name', 255).nullable();
    // The parsed file and its evaluation against the table at upload time.
    table.json('report').notNullable();
    table.integer('uploaded_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['stackup_id', 'kind']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['stackup_uploads', 'stackup_shares', 'stackups']) await knex.schema.dropTable(table);
}
