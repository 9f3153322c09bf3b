/** Projects, their members and the cantilevers designed in them. */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010100_projects');
  await knex.schema.createTable('projects', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.string('site', 200).notNullable().defaultTo('');
    t.string('code_basis', 200).notNullable();
    t.string('units', 2).notNullable().defaultTo('US');
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users');
    t.timestamp('created_at').notNullable();
  });
  await knex.schema.createTable('project_members', (t) => {
    t.integer('project_id').unsigned().notNullable().references('id').inTable('projects').onDelete('CASCADE');
    t.integer('user_id').unsigned().notNullable().references('id').inTable('users');
    t.timestamp('created_at').notNullable();
    t.primary(['project_id', 'user_id']);
    t.index(['user_id']);
  });
  await knex.schema.createTable('cantilevers', (t) => {
    t.increments('id').primary();
    t.integer('project_id').unsigned().notNullable().references('id').inTable('projects').onDelete('CASCADE');
    t.string('name', 120).notNullable();
    t.string('description', 500).notNullable().defaultTo('');
    // Points at revisions.id; no foreign key because revisions reference cantilevers (a cycle).
    t.integer('current_revision_id').unsigned().nullable();
    t.timestamp('created_at').notNullable();
    t.timestamp('updated_at').notNullable();
    t.index(['project_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010100_projects');
  await knex.schema.dropTable('cantilevers');
  await knex.schema.dropTable('project_members');
  await knex.schema.dropTable('projects');
}
