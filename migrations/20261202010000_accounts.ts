/** Accounts, sessions (the connect-session-knex table) and the audit trail. */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010000_accounts');
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable().unique();
    t.string('display_name', 80).notNullable();
    t.string('password_hash', 300).notNullable();
    t.string('role', 16).notNullable();
    t.string('units', 2).notNullable().defaultTo('US');
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at').notNullable();
  });
  await knex.schema.createTable('sessions', (t) => {
    t.string('sid', 255).primary();
    t.json('sess').notNullable();
    t.timestamp('expired').notNullable().index();
  });
  await knex.schema.createTable('audit', (t) => {
    t.increments('id').primary();
    t.string('kind', 32).notNullable().index();
    t.integer('user_id').unsigned().nullable().references('id').inTable('users');
    t.string('subject', 254).notNullable().defaultTo('');
    t.text('detail').notNullable().defaultTo('');
    t.timestamp('created_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010000_accounts');
  await knex.schema.dropTable('audit');
  await knex.schema.dropTable('sessions');
  await knex.schema.dropTable('users');
}
