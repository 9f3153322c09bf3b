/**
 * The engine's one reused arena (member/analysis.ts Arena.reset, design.ts): a design leaves
 * nothing behind for the next one. No oracle numbers: the reference is the same document run alone.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../../shared/engine/design';
import { exampleDesign, exampleMemberOnly, exampleTapered } from '../../../shared/engine/examples';
import { Arena } from '../../../shared/engine/member/analysis';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';

describe('the reused arena', () => {
  it('hands out zeroed views again after reset, in the same block', () => {
    const arena = new Arena(10);
    const a = arena.take(6);
    a.fill(7);
    arena.reset();
    const b = arena.take(6);
    expect([...b]).toEqual([0, 0, 0, 0, 0, 0]);
    expect(b.buffer).toBe(a.buffer);
    // More than the block holds: a new block, zeroed.
    expect([...arena.take(20)].every((v) => v === 0)).toBe(true);
  });

  it('a design gives the same result whatever ran before it (with and without stations)', () => {
    const docs = [exampleDesign, exampleMemberOnly, exampleTapered].map((d) => parsedDesignSchema.parse(d));
    const alone = docs.map((d) => JSON.stringify(evaluateDesign(d, { stations: true })));
    for (let round = 0; round < 2; round++)
      for (let k = docs.length - 1; k >= 0; k--) {
        evaluateDesign(docs[(k + 1) % docs.length], { stations: round === 0 });
        expect(JSON.stringify(evaluateDesign(docs[k], { stations: true }))).toBe(alone[k]);
      }
  });
});
