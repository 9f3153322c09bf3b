/**
 * Attachments get a description (the uploader's words) and may belong to one revision of their
 * cantilever. Written with the schema builder only, so it runs the same on SQLite and PostgreSQL;
 * that the revision is one of the same cantilever is checked by the service.
 */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

const NAME = 'migration 20261203100000_attachment_details';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('attachments', (t) => {
    t.string('description', 500).notNullable().defaultTo('');
    t.integer('revision_id').unsigned().nullable().references('id').inTable('revisions').onDelete('SET NULL');
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('attachments', (t) => {
    t.dropForeign(['revision_id']);
  });
  await knex.schema.alterTable('attachments', (t) => {
    t.dropColumn('revision_id');
    t.dropColumn('description');
  });
}
