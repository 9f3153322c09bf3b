/**
 * The number of identical beams a cantilever stands for (the plate schedule's quantity column).
 * Written with the schema builder only, so it runs the same on SQLite and PostgreSQL.
 */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

const NAME = 'migration 20261203040000_cantilever_quantity';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('cantilevers', (t) => {
    t.integer('quantity').notNullable().defaultTo(1);
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('cantilevers', (t) => {
    t.dropColumn('quantity');
  });
}
