/**
 * Fuzzing the two API routes that take a design document: POST /api/check and the revision save.
 * Whatever the document, the answer is 200/201 with a result that holds the engine's invariants
 * (resultProblems), or 400 naming at least one field, or 403 for a save outside the role's rights;
 * never a 5xx, never NaN. `npm run fuzz` runs many more cases (FUZZ_SCALE).
 */
import fc from 'fast-check';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dialectOf } from '../../server/db/knex';
import { createTestEnv, type TestEnv } from '../helpers/api';
import { errorProblems, fuzzRuns, fuzzTimeout, mutatedDesign, resultProblems } from '../helpers/fuzz';

describe('fuzzed design documents through the API', { timeout: fuzzTimeout() }, () => {
  let env: TestEnv;
  let engineer: TestAgent;
  beforeAll(async () => {
    env = await createTestEnv();
    engineer = await env.login('engineer');
  });
  afterAll(async () => env.close());

  it('POST /api/check answers 200 with a sound result or 400 naming a field', async () => {
    const seen = { ok: 0, invalid: 0 };
    await fc.assert(
      fc.asyncProperty(mutatedDesign, async (input) => {
        const res = await engineer.post('/api/check').send({ input });
        if (res.status === 200) {
          seen.ok += 1;
          expect(resultProblems(res.body)).toEqual([]);
        } else {
          expect(res.status).toBe(400);
          seen.invalid += 1;
          expect(errorProblems(res.body)).toEqual([]);
        }
      }),
      { numRuns: fuzzRuns(1000) },
    );
    console.info(`fuzz /api/check: ${seen.ok} answered, ${seen.invalid} refused`);
    // The generator reaches both sides: valid odd documents and refused ones.
    expect(seen.ok).toBeGreaterThan(0);
    expect(seen.invalid).toBeGreaterThan(0);
  });

  it('a revision save answers 201, 400 naming a field, or 403 (edit rights), never 5xx', async () => {
    const architect = await env.login('architect');
    const seen = { saved: 0, invalid: 0, forbidden: 0 };
    await fc.assert(
      fc.asyncProperty(mutatedDesign, async (input) => {
        const latest = await env
          .db('revisions')
          .where({ cantilever_id: env.cantileverId })
          .max({ n: 'number' });
        const res = await architect
          .post(`/api/cantilevers/${env.cantileverId}/revisions`)
          .send({ baseRevision: Number(latest[0]!.n), message: 'fuzz', input });
        expect([201, 400, 403]).toContain(res.status);
        if (res.status === 201) {
          seen.saved += 1;
          expect(resultProblems(res.body.result)).toEqual([]);
        } else if (res.status === 400) {
          seen.invalid += 1;
          expect(errorProblems(res.body)).toEqual([]);
        } else seen.forbidden += 1;
      }),
      { numRuns: fuzzRuns(300) },
    );
    console.info(
      `fuzz save: ${seen.saved} saved, ${seen.invalid} refused, ${seen.forbidden} outside the role`,
    );
    expect(seen.invalid).toBeGreaterThan(0);
    if (dialectOf(env.db) === 'sqlite') {
      const integrity = (await env.db.raw('PRAGMA integrity_check')) as { integrity_check: string }[];
      expect(integrity[0]!.integrity_check).toBe('ok');
    }
  });
});
