/**
 * Fuzzing `reachline check -`: random documents and random text on standard input. Exit 0 or 1
 * with a sound result on stdout and the caution on stderr, or exit 2 with nothing on stdout and one
 * "field: problem" line per problem on stderr; never a stack trace, never NaN.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CliIo } from '../../server/cli/check-command';
import { main } from '../../server/cli/main';
import { CAUTION } from '../../shared/engine/types';
import { fuzzRuns, fuzzTimeout, mutatedDesign, resultProblems } from '../helpers/fuzz';

async function run(stdin: string) {
  let out = '';
  let err = '';
  const io: CliIo = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readStdin: async () => stdin,
  };
  const code = await main(['check', '-'], io);
  return { code, out, err };
}

const text: fc.Arbitrary<string> = fc.oneof(
  { weight: 6, arbitrary: mutatedDesign.map((d) => JSON.stringify(d)) },
  { weight: 1, arbitrary: mutatedDesign.map((d) => `\uFEFF${JSON.stringify(d, null, 2)}`) },
  {
    weight: 1,
    arbitrary: fc.tuple(mutatedDesign, fc.nat()).map(([d, cut]) => {
      const t = JSON.stringify(d);
      return t.slice(0, cut % t.length);
    }),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 60 }) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 2 }).map((v) => JSON.stringify(v)) },
);

describe('reachline check with fuzzed input', { timeout: fuzzTimeout() }, () => {
  it('exits 0/1 with a sound result or 2 with field lines, never a stack trace', async () => {
    const seen = { result: 0, refused: 0 };
    await fc.assert(
      fc.asyncProperty(text, async (stdin) => {
        const r = await run(stdin);
        expect([0, 1, 2]).toContain(r.code);
        expect(r.err).not.toMatch(/\n\s+at .+:\d+:\d+/);
        if (r.code === 2) {
          seen.refused += 1;
          expect(r.out).toBe('');
          const lines = r.err.trim().split('\n');
          expect(lines.length).toBeGreaterThan(0);
          for (const line of lines) expect(line).toMatch(/^\S[^\n]*: \S/);
        } else {
          seen.result += 1;
          const result = JSON.parse(r.out) as { ok: boolean };
          expect(resultProblems(result)).toEqual([]);
          expect(r.code).toBe(result.ok ? 0 : 1);
          expect(r.err).toContain(CAUTION.slice(0, 40));
        }
      }),
      { numRuns: fuzzRuns(1500) },
    );
    console.info(`fuzz CLI: ${seen.result} results, ${seen.refused} refused`);
    expect(seen.result).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(0);
  });
});
