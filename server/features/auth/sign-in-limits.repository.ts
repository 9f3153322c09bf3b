/**
 * Failed sign-ins, kept in the database so the limits hold across several app instances and
 * restarts. Keys are `account:<email>` and `address:<client address>`. Only failures are
 * written; a successful sign-in clears its account's failures.
 */
import type { Knex } from 'knex';
import { nowIso } from '../../db/knex';

export async function countFailures(db: Knex, keys: string[], since: Date): Promise<Map<string, number>> {
  const rows = await db('sign_in_failures')
    .whereIn('key', keys)
    .where('created_at', '>=', since.toISOString())
    .groupBy('key')
    .select('key')
    .count<{ key: string; n: number | string }[]>({ n: '*' });
  return new Map(rows.map((r) => [r.key, Number(r.n)]));
}

export async function recordFailure(db: Knex, keys: string[], olderThan: Date): Promise<void> {
  const created = nowIso();
  await db.transaction(async (trx) => {
    await trx('sign_in_failures').insert(keys.map((key) => ({ key, created_at: created })));
    // Keeps the table small: rows past the window count for nothing.
    await trx('sign_in_failures').where('created_at', '<', olderThan.toISOString()).delete();
  });
}

export async function clearFailures(db: Knex, key: string): Promise<void> {
  await db('sign_in_failures').where({ key }).delete();
}
