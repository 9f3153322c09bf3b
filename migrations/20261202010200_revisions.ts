/**
 * Revisions (immutable), reviews and comments. Immutability is enforced by the database itself,
 * by triggers on both databases: SQLite triggers and their plpgsql twins refuse any UPDATE of a
 * revision or a review, the DELETE of an approved revision and the DELETE of an approval
 * (PostgreSQL also refuses TRUNCATE of both tables).
 */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

const NAME = 'migration 20261202010200_revisions';

/** plpgsql: one function refusing with the message given as the trigger's argument. */
const PG_UP = [
  `CREATE FUNCTION reachline_refuse() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     RAISE EXCEPTION '%', TG_ARGV[0] USING ERRCODE = 'restrict_violation';
   END $$`,
  `CREATE FUNCTION reachline_revisions_keep_approved() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     IF EXISTS (SELECT 1 FROM reviews WHERE reviews.revision_id = OLD.id AND reviews.state = 'approved') THEN
       RAISE EXCEPTION 'an approved revision cannot be deleted' USING ERRCODE = 'restrict_violation';
     END IF;
     RETURN OLD;
   END $$`,
  `CREATE TRIGGER revisions_immutable BEFORE UPDATE ON revisions
   FOR EACH ROW EXECUTE FUNCTION reachline_refuse('revisions are immutable: save a new revision instead')`,
  `CREATE TRIGGER revisions_no_truncate BEFORE TRUNCATE ON revisions
   FOR EACH STATEMENT EXECUTE FUNCTION reachline_refuse('revisions are immutable: they cannot be truncated')`,
  `CREATE TRIGGER revisions_keep_approved BEFORE DELETE ON revisions
   FOR EACH ROW EXECUTE FUNCTION reachline_revisions_keep_approved()`,
  `CREATE TRIGGER reviews_keep_approval BEFORE DELETE ON reviews
   FOR EACH ROW WHEN (OLD.state = 'approved') EXECUTE FUNCTION reachline_refuse('an approval cannot be deleted')`,
  `CREATE TRIGGER reviews_immutable BEFORE UPDATE ON reviews
   FOR EACH ROW EXECUTE FUNCTION reachline_refuse('reviews are immutable')`,
  `CREATE TRIGGER reviews_no_truncate BEFORE TRUNCATE ON reviews
   FOR EACH STATEMENT EXECUTE FUNCTION reachline_refuse('reviews are immutable: they cannot be truncated')`,
];

export async function up(knex: Knex): Promise<void> {
  const dialect = dialectOf(knex, NAME);
  await knex.schema.createTable('revisions', (t) => {
    t.increments('id').primary();
    t.integer('cantilever_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('cantilevers')
      .onDelete('CASCADE');
    t.integer('number').notNullable();
    t.integer('author_id').unsigned().notNullable().references('id').inTable('users');
    t.string('message', 500).notNullable();
    t.text('input_json').notNullable();
    t.text('result_json').notNullable();
    t.string('engine_version', 32).notNullable();
    t.integer('base_revision_id').unsigned().nullable().references('id').inTable('revisions');
    t.boolean('ok').notNullable();
    t.timestamp('created_at').notNullable();
    t.unique(['cantilever_id', 'number']);
  });
  await knex.schema.createTable('reviews', (t) => {
    t.increments('id').primary();
    t.integer('revision_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('revisions')
      .onDelete('CASCADE');
    t.string('state', 24).notNullable();
    t.integer('reviewer_id').unsigned().notNullable().references('id').inTable('users');
    t.text('comment').notNullable().defaultTo('');
    t.timestamp('created_at').notNullable();
    t.index(['revision_id']);
  });
  await knex.schema.createTable('comments', (t) => {
    t.increments('id').primary();
    t.integer('revision_id')
      .unsigned()
      .notNullable()
      .references('id')
      .inTable('revisions')
      .onDelete('CASCADE');
    t.integer('author_id').unsigned().notNullable().references('id').inTable('users');
    t.text('body').notNullable();
    t.timestamp('created_at').notNullable();
    t.index(['revision_id']);
  });
  if (dialect === 'postgres') {
    for (const statement of PG_UP) await knex.raw(statement);
  }
  if (dialect === 'sqlite') {
    await knex.raw(`
      CREATE TRIGGER revisions_immutable
      BEFORE UPDATE ON revisions
      BEGIN
        SELECT RAISE(ABORT, 'revisions are immutable: save a new revision instead');
      END`);
    await knex.raw(`
      CREATE TRIGGER revisions_keep_approved
      BEFORE DELETE ON revisions
      WHEN EXISTS (SELECT 1 FROM reviews WHERE reviews.revision_id = OLD.id AND reviews.state = 'approved')
      BEGIN
        SELECT RAISE(ABORT, 'an approved revision cannot be deleted');
      END`);
    await knex.raw(`
      CREATE TRIGGER reviews_keep_approval
      BEFORE DELETE ON reviews
      WHEN OLD.state = 'approved'
      BEGIN
        SELECT RAISE(ABORT, 'an approval cannot be deleted');
      END`);
    await knex.raw(`
      CREATE TRIGGER reviews_immutable
      BEFORE UPDATE ON reviews
      BEGIN
        SELECT RAISE(ABORT, 'reviews are immutable');
      END`);
  }
}

export async function down(knex: Knex): Promise<void> {
  const dialect = dialectOf(knex, NAME);
  if (dialect === 'sqlite') {
    for (const name of [
      'reviews_immutable',
      'reviews_keep_approval',
      'revisions_keep_approved',
      'revisions_immutable',
    ]) {
      await knex.raw(`DROP TRIGGER IF EXISTS ${name}`);
    }
  }
  await knex.schema.dropTable('comments');
  await knex.schema.dropTable('reviews');
  await knex.schema.dropTable('revisions');
  if (dialect === 'postgres') {
    // The triggers went with their tables.
    await knex.raw('DROP FUNCTION IF EXISTS reachline_revisions_keep_approved()');
    await knex.raw('DROP FUNCTION IF EXISTS reachline_refuse()');
  }
}
