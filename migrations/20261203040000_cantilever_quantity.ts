/**
 * The number of identical beams a cantilever stands for (the plate schedule's quantity column).
 * Written with the schema builder only, so it runs the same on SQLite and PostgreSQL.
 */
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cantilevers', (t) => {
    t.integer('quantity').notNullable().defaultTo(1);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('cantilevers', (t) => {
    t.dropColumn('quantity');
  });
}
