/**
 * Golden results: every entry of the golden corpus (golden-corpus.ts) must give exactly the output
 * recorded in golden-hashes.json (a SHA-256 of its JSON, numbers as their shortest round-trip text,
 * so a change in the last bit of any number is caught). It guards changes made for speed; a change
 * of the engine's results on purpose records the corpus again:
 *   GOLDEN_RECORD=1 npx vitest run --project unit tests/shared/engine/golden/golden.test.ts
 *   npx prettier --write tests/shared/engine/golden
 * and says why in the commit. Some entries are also stored whole (golden-full.json) for a readable diff.
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FULL_RECORDS, goldenEntries } from './golden-corpus';

const HASHES = join(__dirname, 'golden-hashes.json');
const FULL = join(__dirname, 'golden-full.json');
const RECORD = process.env.GOLDEN_RECORD === '1';

/** JSON with -0 kept apart from 0 (JSON.stringify would write both as 0). */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => (Object.is(v, -0) ? '-0' : v));
}

const sha = (text: string) => createHash('sha256').update(text).digest('hex');

describe('golden results', () => {
  const entries = goldenEntries();

  it('has a large corpus with unique names', () => {
    expect(entries.length).toBeGreaterThan(500);
    expect(new Set(entries.map((e) => e.name)).size).toBe(entries.length);
  });

  it('every entry gives exactly the recorded output', () => {
    const outputs = new Map(entries.map((e) => [e.name, canonical(e.run())]));
    const hashes = Object.fromEntries([...outputs].map(([name, text]) => [name, sha(text)]));
    const full = Object.fromEntries(FULL_RECORDS.map((name) => [name, JSON.parse(outputs.get(name)!)]));
    if (RECORD || !existsSync(HASHES)) {
      writeFileSync(HASHES, `${JSON.stringify(hashes, null, 1)}\n`);
      writeFileSync(FULL, `${JSON.stringify(full)}\n`);
    }
    const recorded = JSON.parse(readFileSync(HASHES, 'utf8')) as Record<string, string>;
    expect(Object.keys(hashes).sort()).toEqual(Object.keys(recorded).sort());
    const changed = Object.keys(hashes).filter((name) => hashes[name] !== recorded[name]);
    // The stored whole outputs first: a readable diff of what changed.
    expect(full).toEqual(JSON.parse(readFileSync(FULL, 'utf8')));
    expect(changed).toEqual([]);
  });
});
