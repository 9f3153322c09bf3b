/**
 * Revisions (immutable), reviews and comments. Immutability is enforced by the database itself:
 * on SQLite, triggers refuse any UPDATE of a revision and the DELETE of an approved one.
 * (On PostgreSQL the same rules would be written as plpgsql triggers; not supported yet.)
 */
import type { Knex } from 'knex';

function sqlite(knex: Knex): boolean {
  const client = String(knex.client.config.client);
  return client === 'better-sqlite3' || client === 'sqlite3';
}

export async function up(knex: Knex): Promise<void> {
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
  if (sqlite(knex)) {
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
  if (sqlite(knex)) {
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
}
