/** Attachments, the e-mail outbox and user-imported shapes. */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010300_files_mail_shapes');
  await knex.schema.createTable('attachments', (t) => {
    t.increments('id').primary();
    t.integer('cantilever_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('cantilevers')
      .onDelete('CASCADE');
    t.string('original_name', 255).notNullable();
    t.string('stored_name', 64).notNullable().unique();
    t.string('mime_type', 64).notNullable();
    t.integer('size').notNullable();
    t.string('sha256', 64).notNullable();
    t.integer('uploader_id').unsigned().notNullable().references('id').inTable('users');
    t.timestamp('created_at').notNullable();
    t.index(['cantilever_id']);
  });
  await knex.schema.createTable('outbox', (t) => {
    t.increments('id').primary();
    t.text('to_json').notNullable();
    t.string('subject', 300).notNullable();
    t.text('text').notNullable();
    t.text('html').nullable();
    t.string('status', 16).notNullable().defaultTo('pending');
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('last_error').nullable();
    t.timestamp('next_attempt_at').notNullable();
    t.timestamp('created_at').notNullable();
    t.timestamp('sent_at').nullable();
    // Set by the built-in fake SMTP server when it received this message.
    t.timestamp('captured_at').nullable();
    t.index(['status', 'next_attempt_at']);
  });
  await knex.schema.createTable('shapes', (t) => {
    t.increments('id').primary();
    t.string('label', 40).notNullable().unique();
    t.string('family', 8).notNullable();
    t.text('props_json').notNullable();
    t.integer('imported_by').unsigned().notNullable().references('id').inTable('users');
    t.timestamp('created_at').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, 'migration 20261202010300_files_mail_shapes');
  await knex.schema.dropTable('shapes');
  await knex.schema.dropTable('outbox');
  await knex.schema.dropTable('attachments');
}
