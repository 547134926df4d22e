/**
 * The rest of the team catalog (conductors, line types, the audit trail) and the
 * account machinery (API tokens, invitations, password resets, session versions).
 */
import type { Knex } from 'knex';

const CATALOG_STATES = ['draft', 'proposed', 'approved', 'retired'];

function catalogColumns(knex: Knex, table: Knex.CreateTableBuilder): void {
  table.enum('state', CATALOG_STATES).notNullable().defaultTo('draft');
  table.integer('version').unsigned().notNullable().defaultTo(1);
  table.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
  table.integer('updated_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
  table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  table.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
}

export async function up(knex: Knex): Promise<void> {
  // Bumped on password change and reset so sign-in tokens issued before it stop working.
  await knex.schema.alterTable('users', (table) => {
    table.integer('session_version').unsigned().notNullable().defaultTo(1);
  });

  await knex.schema.createTable('conductors', (table) => {
    table.increments('id').primary();
    table.string('name', 120).notNullable().unique();
    table.text('description').nullable();
    table.double('conductivity').notNullable();
    table.double('roughness').notNullable().defaultTo(0);
    // Foil thickness options [m], e.g. [17.4e-6, 34.8e-6].
    table.json('foil_thicknesses').notNullable();
    table.text('notes').nullable();
    catalogColumns(knex, table);
  });

  await knex.schema.createTable('line_types', (table) => {
    table.increments('id').primary();
    table.string('name', 120).notNullable().unique();
    table.text('description').nullable();
    table.string('kind', 40).notNullable();
    // The kind's geometry fields, SI numbers (and booleans such as cpw.grounded).
    table.json('geometry').notNullable();
    table.integer('material_id').unsigned().notNullable().references('id').inTable('materials').onDelete('RESTRICT');
    table.integer('conductor_id').unsigned().nullable().references('id').inTable('conductors').onDelete('RESTRICT');
    table.enum('target_quantity', ['z0', 'zDiff']).notNullable();
    table.double('target_value').notNullable();
    table.double('target_tolerance_percent').notNullable().defaultTo(10);
    table.double('length_default').nullable();
    table.json('tags').notNullable();
    table.integer('owner_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    catalogColumns(knex, table);
  });

  await knex.schema.createTable('audit_log', (table) => {
    table.bigIncrements('id').primary();
    table.integer('user_id').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.string('entity', 40).notNullable();
    table.integer('entity_id').unsigned().notNullable();
    table.string('action', 40).notNullable();
    table.json('before').nullable();
    table.json('after').nullable();
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['entity', 'entity_id']);
  });

  await knex.schema.createTable('api_tokens', (table) => {
    table.increments('id').primary();
    table.integer('user_id').unsigned().notNullable().references('id').inTable('users').onDelete('CASCADE');
    table.string('name', 80).notNullable();
    table.enum('scope', ['read', 'read-write']).notNullable();
    // SHA-256 of the secret: the secret itself is shown once and never stored.
    table.string('token_hash', 64).notNullable().unique();
    table.string('prefix', 16).notNullable();
    table.timestamp('last_used_at').nullable();
    table.timestamp('revoked_at').nullable();
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('invitations', (table) => {
    table.increments('id').primary();
    table.string('email', 254).notNullable();
    table.enum('role', ['admin', 'engineer', 'viewer']).notNullable();
    table.string('token_hash', 64).notNullable().unique();
    table.integer('invited_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    table.timestamp('expires_at').notNullable();
    table.timestamp('accepted_at').nullable();
    table.timestamp('revoked_at').nullable();
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('password_resets', (table) => {
    table.increments('id').primary();
    table.integer('user_id').unsigned().notNullable().references('id').inTable('users').onDelete('CASCADE');
    table.string('token_hash', 64).notNullable().unique();
    table.timestamp('expires_at').notNullable();
    table.timestamp('used_at').nullable();
    table.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['password_resets', 'invitations', 'api_tokens', 'audit_log', 'line_types', 'conductors']) {
    await knex.schema.dropTable(table);
  }
  await knex.schema.alterTable('users', (table) => table.dropColumn('session_version'));
}
