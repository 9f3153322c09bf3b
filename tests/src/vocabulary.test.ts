/**
 * The one vocabulary: check, design and trend words, their colour classes, and every design-document
 * path in words. The list of paths is walked from the design schema itself, so a field added to the
 * schema without words fails here.
 */
import type { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { designSchema } from '../../shared/schemas/design';
import { documentLeaves } from '../../shared/schemas/document-leaves';
import { exampleDesign } from '../../shared/engine/examples';
import { evaluateDesign } from '../../shared/engine/design';
import { DesignInputError } from '../../shared/engine/types';
import {
  CHECK_WORDS,
  DESIGN_WORDS,
  TREND_WORDS,
  checkState,
  checkWord,
  verdictOf,
} from '../../shared/words/check-words';
import { KNOWN_PATHS, pathGroup, pathWords } from '../../shared/words/field-words';
import { CHECK_BAR, CHECK_TEXT, DESIGN_TEXT, TREND_TEXT } from '../../src/lib/verdict-style';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  innerType?: z.ZodType;
  element?: z.ZodType;
  in?: z.ZodType;
}
const defOf = (t: z.ZodType) => (t as unknown as { _zod: { def: Def } })._zod.def;

/** Every path the schema can name: objects, their fields, array elements (index 0) and their fields. */
function schemaPaths(t: z.ZodType, at = ''): string[] {
  const def = defOf(t);
  if (def.type === 'optional' || def.type === 'default' || def.type === 'nullable')
    return schemaPaths(def.innerType as z.ZodType, at);
  if (def.type === 'pipe') return schemaPaths(def.in as z.ZodType, at);
  const here = at ? [at] : [];
  if (def.type === 'object')
    return [
      ...here,
      ...Object.entries(def.shape ?? {}).flatMap(([k, v]) => schemaPaths(v, at ? `${at}.${k}` : k)),
    ];
  if (def.type === 'array') return [...here, ...schemaPaths(def.element as z.ZodType, `${at}[0]`)];
  return here;
}

const PATHS = schemaPaths(designSchema as unknown as z.ZodType);
const RAW = /[.[\]]|[a-z][A-Z]/;

describe('field names in words', () => {
  it('walks a real list of paths from the design schema', () => {
    expect(PATHS.length).toBeGreaterThan(60);
    for (const p of [
      'member.length',
      'loads.area[0].value',
      'connection.weld.electrode',
      'loads.seismic.SDS',
    ])
      expect(PATHS).toContain(p);
  });

  it('has its own words for every path of the schema, with no path, bracket or camelCase left in them', () => {
    const known = new Set(KNOWN_PATHS);
    const missing = PATHS.map((p) => p.replace(/\[\d+\]/g, '[]')).filter((p) => !known.has(p));
    expect(missing).toEqual([]);
    for (const p of PATHS) {
      const words = pathWords(p);
      expect(words, p).not.toMatch(RAW);
      expect(words, p).toMatch(/^(Settings|Reach|Section|Loads|Limits|Support): \S/);
    }
  });

  it('numbers list entries from 1 and reads the API, engine and form spellings alike', () => {
    expect(pathWords('loads.area[0].value')).toBe('Loads: area load 1, value');
    expect(pathWords('loads.area.0.value')).toBe('Loads: area load 1, value');
    expect(pathWords('input.loads.point[2].at')).toBe('Loads: point load 3, distance from the root');
    expect(pathWords('member.lateralSupport.braces[1]')).toBe('Reach: brace 2, distance from the root');
    expect(pathWords('(document)')).toBe('The whole design document');
    expect(pathGroup('connection.anchors.embedment')).toBe('Support');
  });

  it('gives words to every path the engine names in its input errors', () => {
    const bad = [
      { ...exampleDesign, member: { ...exampleDesign.member, section: { shape: 'W99X999' } } },
      {
        ...exampleDesign,
        loads: { ...exampleDesign.loads, point: [{ case: 'D' as const, value: '1 kip', at: '40 ft' }] },
      },
    ];
    let seen = 0;
    for (const doc of bad) {
      try {
        evaluateDesign(parsedDesignSchema.parse(doc));
      } catch (e) {
        if (!(e instanceof DesignInputError)) throw e;
        for (const issue of e.issues) {
          seen += 1;
          expect(pathWords(issue.path), issue.path).not.toMatch(RAW);
        }
      }
    }
    expect(seen).toBeGreaterThanOrEqual(2);
  });

  it('names every leaf of a stored document (the Review and package input lists)', () => {
    for (const [path] of documentLeaves(exampleDesign)) expect(pathWords(path), path).not.toMatch(RAW);
  });
});

describe('verdict words and colours', () => {
  const c = (ratio: number | null, ok = true) => ({ ratio, ok });

  it('words a check by one rule everywhere: passes, near limit, does not pass, not computed', () => {
    expect(checkWord(c(0.3))).toBe(CHECK_WORDS.pass);
    expect(checkWord(c(0.9))).toBe(CHECK_WORDS.near);
    expect(checkWord(c(1.0))).toBe(CHECK_WORDS.near);
    expect(checkWord(c(1.01, false))).toBe(CHECK_WORDS.fail);
    // The engine's ok wins over a low ratio; a missing ratio is never a pass, whatever ok says.
    expect(checkWord(c(0.2, false))).toBe(CHECK_WORDS.fail);
    expect(checkWord(c(null, true))).toBe(CHECK_WORDS.none);
    expect(checkState(c(Number.NaN, true))).toBe('none');
  });

  it('words a design: passes only when every check passes and the engine agrees', () => {
    expect(verdictOf([]).word).toBe(DESIGN_WORDS.none);
    expect(verdictOf([{ ...c(0.5), id: 'a' } as never]).word).toBe(DESIGN_WORDS.pass);
    expect(verdictOf([{ ...c(0.5), id: 'a' } as never], false).word).toBe(DESIGN_WORDS.fail);
    expect(verdictOf([{ ...c(null), id: 'a' } as never]).word).toBe(DESIGN_WORDS.fail);
  });

  it('has one colour class for every state, and none of the old words', () => {
    for (const map of [CHECK_TEXT, CHECK_BAR])
      expect(Object.keys(map).sort()).toEqual(Object.keys(CHECK_WORDS).sort());
    expect(Object.keys(DESIGN_TEXT).sort()).toEqual(Object.keys(DESIGN_WORDS).sort());
    expect(Object.keys(TREND_TEXT).sort()).toEqual(Object.keys(TREND_WORDS).sort());
    const all = [
      ...Object.values(CHECK_WORDS),
      ...Object.values(DESIGN_WORDS),
      ...Object.values(TREND_WORDS),
    ];
    for (const old of ['ample', 'adequate', 'exceeds', 'worse', 'better', 'fail'])
      expect(
        all.some((w) => new RegExp(`\\b${old}\\b`).test(w)),
        old,
      ).toBe(false);
  });
});
