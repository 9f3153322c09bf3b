/**
 * The SQLite connection reuses prepared statements (server/db/knex.ts): the same text gives the
 * same statement, results stay right when a cached statement runs again with other bindings, a
 * schema change is still seen, and the cache stays bounded.
 */
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { cachePreparedStatements, createDb } from '../../server/db/knex';

describe('prepared statements on SQLite', () => {
  it('hands back the same statement for the same text and keeps at most 500', () => {
    const raw = new Database(':memory:');
    const calls: string[] = [];
    const original = raw.prepare.bind(raw);
    raw.prepare = ((source: string) => {
      calls.push(source);
      return original(source);
    }) as typeof raw.prepare;
    cachePreparedStatements(raw);
    const a = raw.prepare('select 1 as x');
    const b = raw.prepare('select 1 as x');
    expect(b).toBe(a);
    expect(calls).toEqual(['select 1 as x']);
    for (let i = 0; i < 600; i++) raw.prepare(`select ${i} as x`);
    // The oldest texts were dropped: preparing the first one again compiles it again.
    const before = calls.length;
    raw.prepare('select 1 as x');
    expect(calls.length).toBe(before + 1);
    raw.close();
  });

  it('answers rightly through Knex when one statement runs with different bindings and after a schema change', async () => {
    const db = createDb(':memory:');
    try {
      await db.schema.createTable('t', (t) => {
        t.integer('id').primary();
        t.string('name');
      });
      await db('t').insert([
        { id: 1, name: 'one' },
        { id: 2, name: 'two' },
      ]);
      const first = (await db('t').where('id', 1).first()) as { name: string };
      const second = (await db('t').where('id', 2).first()) as { name: string };
      expect([first.name, second.name]).toEqual(['one', 'two']);
      await db.schema.alterTable('t', (t) => t.string('extra').defaultTo('x'));
      const again = (await db('t').where('id', 1).first()) as { name: string; extra: string };
      expect(again).toEqual({ id: 1, name: 'one', extra: 'x' });
    } finally {
      await db.destroy();
    }
  });
});
