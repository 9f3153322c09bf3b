/**
 * Lightest sections that work: ordered by steel weight, and every shape listed as passing passes
 * when the engine runs it alone (checkDocument, the CLI's and the API's entry); every failing one
 * fails alone with the check named. The oracle is the engine itself run one document at a time.
 */
import { describe, expect, it } from 'vitest';
import { checkDocument } from '../../../shared/engine/check-document';
import { EAST_DECK_DESIGN } from '../../../server/db/demo-designs';
import { SHAPES } from '../../../shared/engine/shapes/table';
import type { DesignDocument } from '../../../shared/schemas/design';
import { passes } from '../../../shared/words/check-words';
import { lightestSections } from '../../../shared/study/lightest-sections';

/** The demo project's east deck (invented scenario numbers) as a prismatic beam reaching 12 ft. */
const at12: DesignDocument = {
  ...EAST_DECK_DESIGN,
  member: { ...EAST_DECK_DESIGN.member, length: '12 ft', section: { shape: 'W12X26' } },
  loads: { ...EAST_DECK_DESIGN.loads, point: [{ case: 'D', value: '150 lbf', at: '12 ft' }] },
};

function alone(doc: DesignDocument, shape: string, tipDepth?: string) {
  const out = checkDocument({
    ...doc,
    member: { ...doc.member, section: tipDepth ? { shape, tipDepth } : { shape } },
  });
  if (!out.ok) throw new Error(`${shape}: ${out.issues[0].message}`);
  return out.result;
}

describe('lightest sections', () => {
  const outcome = lightestSections(at12);
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.issues));
  const { passing, failing } = outcome.result;

  it('tries every W, HSS, pipe and C shape of the table once', () => {
    expect(passing.length + failing.length).toBe(SHAPES.length);
    expect(passing.length).toBeGreaterThan(0);
    expect(failing.length).toBeGreaterThan(0);
  });

  it('orders both lists by steel weight, lightest first', () => {
    for (const list of [passing, failing])
      for (let k = 1; k < list.length; k++)
        expect(list[k].steelWeight.value).toBeGreaterThanOrEqual(list[k - 1].steelWeight.value);
  });

  it('every passing shape passes alone, with the same weight, governing check and ratio', () => {
    for (const p of passing) {
      const r = alone(at12, p.shape);
      expect(r.ok).toBe(true);
      expect(r.checks.every(passes)).toBe(true);
      expect(r.member.steelWeight).toEqual(p.steelWeight);
      const worst = r.checks.reduce((a, b) => ((b.ratio ?? Infinity) > (a.ratio ?? Infinity) ? b : a));
      expect(p.governing).toEqual({ id: worst.id, ratio: worst.ratio });
    }
  });

  it('every failing shape fails alone by the check it names (or the field the engine refuses)', () => {
    for (const f of failing.filter((x) => x.note === undefined).slice(0, 60)) {
      const r = alone(at12, f.shape);
      expect(r.ok).toBe(false);
      expect(r.checks.find((c) => c.id === f.failedBy)?.ok).toBe(false);
    }
  });

  it('answers "the lightest W that reaches 12 ft here" with a W passing alone, lighter Ws failing', () => {
    const w = lightestSections(at12, { families: ['W'] });
    if (!w.ok) throw new Error('invalid');
    const lightest = w.result.passing[0];
    expect(lightest.shape).toMatch(/^W/);
    for (const f of w.result.failing.filter((x) => x.steelWeight.value < lightest.steelWeight.value))
      expect(alone(at12, f.shape).ok).toBe(false);
  });

  it('tapered: each W gets the shallowest tip on the 1/4 in grid that passes, and 1/4 in less does not', () => {
    const tapered: DesignDocument = {
      ...at12,
      member: { ...at12.member, section: { shape: 'W12X26', tipDepth: '7 in' } },
    };
    const t = lightestSections(tapered, {
      families: ['W'],
      catalog: SHAPES.filter((s) => /^W1[02]X/.test(s.label)),
    });
    if (!t.ok) throw new Error('invalid');
    expect(t.result.passing.length).toBeGreaterThan(0);
    for (const p of t.result.passing) {
      const tip = p.tipDepth;
      if (!tip) {
        // Only the full depth passes: the shape passes prismatic.
        expect(alone(tapered, p.shape).ok).toBe(true);
        continue;
      }
      expect(tip.unit).toBe('in');
      const full = SHAPES.find((s) => s.label === p.shape)?.d ?? 0;
      const r = tip.value < full ? alone(tapered, p.shape, `${tip.value} in`) : alone(tapered, p.shape);
      expect(r.ok).toBe(true);
      expect(r.member.steelWeight).toEqual(p.steelWeight);
      const below = checkDocument({
        ...tapered,
        member: { ...tapered.member, section: { shape: p.shape, tipDepth: `${tip.value - 0.25} in` } },
      });
      // One step shallower either is refused (below the shallowest web) or does not pass.
      expect(below.ok ? below.result.ok : false).toBe(false);
    }
  });

  it('refuses an invalid document with its field paths', () => {
    const bad = lightestSections({
      member: { length: '-3 ft', spacing: '4 ft', section: { shape: 'W8X18' } },
    });
    expect(bad).toEqual({
      ok: false,
      issues: [{ path: 'member.length', message: 'must be a positive length, got "-3 ft"' }],
    });
  });
});
