/**
 * Hardening: shapes owned by a project or by the organisation, the section properties a
 * revision was computed with, password state on accounts, failed sign-ins in a table (so limits
 * hold across app instances), and SQLite triggers against INSERT OR REPLACE on revisions and
 * against a review row inserted after an approval, with plpgsql twins on PostgreSQL (where the
 * overwrite would be INSERT … ON CONFLICT DO UPDATE: refused here before the update trigger).
 */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

const NAME = 'migration 20261203020000_security';

const PG_UP = [
  // unique_violation: a concurrent writer that took the number is told the same as the unique key would.
  `CREATE FUNCTION reachline_revisions_no_replace() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     IF EXISTS (SELECT 1 FROM revisions
                WHERE id = NEW.id OR (cantilever_id = NEW.cantilever_id AND number = NEW.number)) THEN
       RAISE EXCEPTION 'revisions are immutable: a revision with this id or number exists'
         USING ERRCODE = 'unique_violation';
     END IF;
     RETURN NEW;
   END $$`,
  `CREATE TRIGGER revisions_no_replace BEFORE INSERT ON revisions
   FOR EACH ROW EXECUTE FUNCTION reachline_revisions_no_replace()`,
  `CREATE FUNCTION reachline_reviews_none_after_approval() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     IF EXISTS (SELECT 1 FROM reviews
                WHERE id = NEW.id OR (revision_id = NEW.revision_id AND state = 'approved')) THEN
       RAISE EXCEPTION 'an approved revision takes no further review rows' USING ERRCODE = 'restrict_violation';
     END IF;
     RETURN NEW;
   END $$`,
  `CREATE TRIGGER reviews_none_after_approval BEFORE INSERT ON reviews
   FOR EACH ROW EXECUTE FUNCTION reachline_reviews_none_after_approval()`,
];

export async function up(knex: Knex): Promise<void> {
  const dialect = dialectOf(knex, NAME);
  await knex.schema.alterTable('shapes', (t) => {
    // null: an organisation shape (imported by an admin, seen by every project).
    t.integer('project_id').unsigned().nullable().references('id').inTable('projects').onDelete('CASCADE');
  });
  await knex.schema.alterTable('shapes', (t) => {
    t.dropUnique(['label']);
    t.unique(['project_id', 'label']);
  });
  // NULLs are distinct in a unique index, so organisation labels need their own index.
  await knex.raw('CREATE UNIQUE INDEX shapes_org_label_unique ON shapes (label) WHERE project_id IS NULL');
  await knex.schema.alterTable('revisions', (t) => {
    // The catalog sections the engine used, by label: a later import can never change this revision.
    t.text('sections_json').nullable();
  });
  await knex.schema.alterTable('users', (t) => {
    t.boolean('must_change_password').notNullable().defaultTo(false);
    // Raised when the password changes: sessions signed in with an older value end.
    t.integer('session_version').notNullable().defaultTo(0);
  });
  await knex.schema.createTable('sign_in_failures', (t) => {
    t.increments('id').primary();
    // 'account:<email>' or 'address:<ip>'
    t.string('key', 300).notNullable();
    t.timestamp('created_at').notNullable();
    t.index(['key', 'created_at']);
  });
  if (dialect === 'postgres') {
    for (const statement of PG_UP) await knex.raw(statement);
  }
  if (dialect === 'sqlite') {
    await knex.raw(`
      CREATE TRIGGER revisions_no_replace
      BEFORE INSERT ON revisions
      WHEN EXISTS (SELECT 1 FROM revisions
                   WHERE id = NEW.id OR (cantilever_id = NEW.cantilever_id AND number = NEW.number))
      BEGIN
        SELECT RAISE(ABORT, 'revisions are immutable: a revision with this id or number exists');
      END`);
    await knex.raw(`
      CREATE TRIGGER reviews_none_after_approval
      BEFORE INSERT ON reviews
      WHEN EXISTS (SELECT 1 FROM reviews
                   WHERE id = NEW.id OR (revision_id = NEW.revision_id AND state = 'approved'))
      BEGIN
        SELECT RAISE(ABORT, 'an approved revision takes no further review rows');
      END`);
  }
}

export async function down(knex: Knex): Promise<void> {
  const dialect = dialectOf(knex, NAME);
  if (dialect === 'sqlite') {
    await knex.raw('DROP TRIGGER IF EXISTS reviews_none_after_approval');
    await knex.raw('DROP TRIGGER IF EXISTS revisions_no_replace');
  }
  if (dialect === 'postgres') {
    await knex.raw('DROP TRIGGER IF EXISTS reviews_none_after_approval ON reviews');
    await knex.raw('DROP TRIGGER IF EXISTS revisions_no_replace ON revisions');
    await knex.raw('DROP FUNCTION IF EXISTS reachline_reviews_none_after_approval()');
    await knex.raw('DROP FUNCTION IF EXISTS reachline_revisions_no_replace()');
  }
  await knex.schema.dropTable('sign_in_failures');
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('session_version');
    t.dropColumn('must_change_password');
  });
  await knex.schema.alterTable('revisions', (t) => {
    t.dropColumn('sections_json');
  });
  await knex.raw('DROP INDEX IF EXISTS shapes_org_label_unique');
  await knex.schema.alterTable('shapes', (t) => {
    t.dropUnique(['project_id', 'label']);
    t.dropForeign(['project_id']);
    t.dropColumn('project_id');
  });
  await knex.schema.alterTable('shapes', (t) => {
    t.unique(['label']);
  });
}
