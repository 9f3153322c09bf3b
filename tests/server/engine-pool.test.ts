/**
 * POST /api/check through the engine's worker pool (server/engine/engine-pool.ts) answers exactly
 * what the in-line engine answers: the same result, byte for byte, for fuzzed documents that the
 * engine computes, and the same 400 with the same field issues for those it refuses.
 */
import fc from 'fast-check';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseDesign, createTestEnv, type TestEnv } from '../helpers/api';
import { fuzzRuns, fuzzTimeout, mutatedDesign } from '../helpers/fuzz';
import { ON_POSTGRES } from '../helpers/test-db';

// SQLite only: what this file tests is the engine's threads. POST /api/check without a projectId
// reads only the session (and the imported shapes when a document names a shape the catalogue lacks),
// which other files of the API suite's PostgreSQL run cover; there this file repeated the engine work.
describe.skipIf(ON_POSTGRES)('the engine in worker threads', { timeout: fuzzTimeout(120_000) }, () => {
  let pooled: TestEnv;
  let inline: TestEnv;
  let viaPool: TestAgent;
  let viaInline: TestAgent;
  beforeAll(async () => {
    pooled = await createTestEnv({ config: { engineThreads: 1 } });
    inline = await createTestEnv({ config: { engineThreads: 0 } });
    viaPool = await pooled.login('engineer');
    viaInline = await inline.login('engineer');
  });
  afterAll(async () => {
    await pooled?.close();
    await inline?.close();
  });

  it('answers a burst of concurrent checks, more than the pool has threads, all with 200', async () => {
    const doc = baseDesign();
    const answers = await Promise.all(
      Array.from({ length: 24 }, () => viaPool.post('/api/check').send({ input: doc })),
    );
    expect(answers.map((a) => a.status)).toEqual(answers.map(() => 200));
    expect(new Set(answers.map((a) => a.text)).size).toBe(1);
  });

  it('answers every document as the in-line engine does', async () => {
    const seen = { computed: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(mutatedDesign, async (input) => {
        const [a, b] = await Promise.all([
          viaPool.post('/api/check').send({ input }),
          viaInline.post('/api/check').send({ input }),
        ]);
        expect(a.status).toBe(b.status);
        expect(a.headers['content-type']).toBe(b.headers['content-type']);
        expect(a.text).toBe(b.text);
        if (a.status === 200) seen.computed += 1;
        else seen.refused += 1;
      }),
      { numRuns: fuzzRuns(150) },
    );
    // Both kinds of answer went through the pool.
    expect(seen.computed).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(0);
  });
});
