/**
 * Several app instances share one outbox: a worker claims a row before it sends it.
 * The claim writes a token and pushes next_attempt_at to the end of a lease; the send is marked
 * only by the claimer holding that token, and a claim whose worker died becomes due again when
 * its lease runs out (a retry, never a loss).
 */
import type { Knex } from 'knex';
import { dialectOf } from '../server/db/knex';

const NAME = 'migration 20261203030000_outbox_claim';

export async function up(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('outbox', (t) => {
    t.string('claim_token', 64).nullable();
    t.timestamp('claimed_at').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  dialectOf(knex, NAME);
  await knex.schema.alterTable('outbox', (t) => {
    t.dropColumn('claimed_at');
    t.dropColumn('claim_token');
  });
}
