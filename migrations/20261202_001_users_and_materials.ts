import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (table) => {
    table.increments('id').primary();
    table.string('email', 254).notNullable().unique();
    table.string('name', 120).notNullable();
    table.string('password_hash', 100).nullable();
    table.enum('role', ['admin', 'engineer', 'viewer']).notNullable().defaultTo('viewer');
    table.json('preferences').nullable();
    table.boolean('is_active').notNullable().defaultTo(true);
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    table.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('materials', (table) => {
    table.increments('id').primary();
    table.string('name', 120).notNullable().unique();
    table.text('description').nullable();
    // Dk and Df at the reference frequency; an optional table of Dk/Df against frequency.
    table.double('dk').notNullable();
    table.double('df').notNullable().defaultTo(0);
    table.double('reference_frequency').notNullable().defaultTo(1e9);
    table.json('dk_df_table').nullable();
    table.double('dielectric_strength').nullable();
    table.text('notes').nullable();
    table.boolean('is_typical').notNullable().defaultTo(false);
    table.enum('state', ['draft', 'proposed', 'approved', 'retired']).notNullable().defaultTo('draft');
    table.integer('version').unsigned().notNullable().defaultTo(1);
    table.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    table.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('materials');
  await knex.schema.dropTable('users');
}
