import { describe, expect, it } from 'vitest';
import { assertFinite, assertStationsFinite } from '../../../shared/engine/finite-guard';
import { DesignInputError } from '../../../shared/engine/types';
import { designSchema } from '../../../shared/schemas/design';
import { parsedDesignSchema } from '../../../shared/schemas/parsed-design';
import { toFieldIssues } from '../../../shared/schemas/quantity';
import { memberDoc, run } from './design-helpers';

/** The issues of the DesignInputError thrown for a document (fails the test if none is thrown). */
function issuesOf(doc: Parameters<typeof run>[0]): { path: string; message: string }[] {
  try {
    run(doc);
  } catch (e) {
    expect(e).toBeInstanceOf(DesignInputError);
    return (e as DesignInputError).issues;
  }
  throw new Error('expected a DesignInputError');
}

const someLoad = { selfWeight: true, area: [], line: [], point: [] };

describe('what the schema cannot see is refused with a field path', () => {
  it('an unknown shape', () => {
    expect(issuesOf(memberDoc({ shape: 'W99X1', loads: someLoad }))).toEqual([
      { path: 'member.section.shape', message: 'unknown shape "W99X1": not in the shapes table' },
    ]);
  });

  it('a point load beyond the tip', () => {
    const issues = issuesOf(
      memberDoc({
        loads: {
          ...someLoad,
          point: [
            { case: 'L', value: '200 lbf', at: '8 ft' },
            { case: 'L', value: '200 lbf', at: '9 ft' },
          ],
        },
      }),
    );
    expect(issues.map((i) => i.path)).toEqual(['loads.point[1].at']);
    expect(issues[0].message).toContain('beyond the tip');
  });

  it('a tip depth not less than the root depth, or too shallow to leave a web', () => {
    expect(
      issuesOf(memberDoc({ section: { shape: 'W12X26', tipDepth: '12.2 in' }, loads: someLoad }))[0].path,
    ).toBe('member.section.tipDepth');
    const shallow = issuesOf(memberDoc({ section: { shape: 'W12X26', tipDepth: '1 in' }, loads: someLoad }));
    expect(shallow[0].path).toBe('member.section.tipDepth');
    expect(shallow[0].message).toContain('too shallow');
  });

  it('a taper on a shape that is not a W', () => {
    expect(
      issuesOf(memberDoc({ section: { shape: 'HSS8X8X1/2', tipDepth: '6 in' }, loads: someLoad }))[0].message,
    ).toContain('W shapes only');
  });

  it('plates that do not make an I', () => {
    const plates = {
      rootDepth: '8 in',
      tipDepth: '10 in',
      flangeWidth: '3 in',
      flangeThickness: '0.5 in',
      webThickness: '3 in',
    };
    expect(issuesOf(memberDoc({ section: { plates }, loads: someLoad })).map((i) => i.path)).toEqual([
      'member.section.plates.tipDepth',
      'member.section.plates.webThickness',
    ]);
  });

  it('an unbraced length longer than the member', () => {
    expect(issuesOf(memberDoc({ unbracedLength: '9 ft', loads: someLoad }))[0].path).toBe(
      'member.unbracedLength',
    );
  });

  it('steel properties outside what the engine covers', () => {
    expect(issuesOf(memberDoc({ steel: { Fy: '500 ksi' }, loads: someLoad }))[0].path).toBe(
      'member.steel.Fy',
    );
    expect(issuesOf(memberDoc({ steel: { E: '2900 ksi' }, loads: someLoad }))[0].path).toBe('member.steel.E');
  });

  it('no load at all', () => {
    expect(issuesOf(memberDoc({}))[0].path).toBe('loads');
  });

  it('the schema itself names the field of a negative length (the CLI and API message)', () => {
    const parsed = designSchema.safeParse({
      ...memberDoc({}),
      member: { ...memberDoc({}).member, length: '-3 ft' },
    });
    expect(parsed.success).toBe(false);
    if (!parsed.success) {
      expect(toFieldIssues(parsed.error)).toContainEqual({
        path: 'member.length',
        message: 'must be a positive length, got "-3 ft"',
      });
    }
  });
});

describe('sizes outside what the engine checks', () => {
  it('a length under 1 ft or over 60 ft, plates out of the weldable range', () => {
    expect(issuesOf(memberDoc({ length: '1e-30 ft', loads: someLoad }))[0].path).toBe('member.length');
    expect(issuesOf(memberDoc({ length: '61 ft', loads: someLoad }))[0].path).toBe('member.length');
    const plates = {
      rootDepth: '16 in',
      tipDepth: '8 in',
      flangeWidth: '1e-9 in',
      flangeThickness: '0.5 in',
      webThickness: '0.25 in',
    };
    expect(issuesOf(memberDoc({ section: { plates }, loads: someLoad }))[0].path).toBe(
      'member.section.plates.flangeWidth',
    );
  });

  it('an absurd load gives finite numbers and a loud failure, never Infinity', () => {
    const r = run(
      memberDoc({
        loads: {
          selfWeight: true,
          area: [],
          line: [],
          point: [{ case: 'L', value: '1e300 kip', at: '8 ft' }],
        },
      }),
    );
    expect(r.ok).toBe(false);
    expect(r.checks.filter((c) => !c.ok).map((c) => c.id)).toContain('member.flexure');
    expect(r.checks.every((c) => Number.isFinite(c.ratio))).toBe(true);
  });

  it('the last guard refuses a result holding NaN or Infinity anywhere', () => {
    expect(() => assertFinite({ member: { a: [1, 2, Number.POSITIVE_INFINITY] } })).toThrow(DesignInputError);
    expect(() => assertFinite({ x: Number.NaN })).toThrow(/not a finite number/);
    expect(() => assertFinite({ x: [1, { y: 2 }], s: 'text', n: null })).not.toThrow();
  });

  it('the station guard refuses NaN or Infinity in any station array, and passes real ones', () => {
    const stations = run(memberDoc({ loads: { area: [{ case: 'L', value: '60 psf' }] } }), {
      stations: true,
    }).stations!;
    expect(() => assertStationsFinite(stations)).not.toThrow();
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      for (const mutate of [
        (s: typeof stations) => (s.x[3] = bad),
        (s: typeof stations) => (s.depth[0] = bad),
        (s: typeof stations) => (s.cases[0].M[5] = bad),
        (s: typeof stations) => s.combinations.at(-1)!.deflection.splice(-1, 1, bad),
        (s: typeof stations) => (s.combinations[0].rotation![2] = bad),
      ]) {
        const copy = structuredClone(stations);
        mutate(copy);
        expect(() => assertStationsFinite(copy)).toThrow(/not a finite number/);
      }
    }
  });
});

describe("a user's imported shapes", () => {
  it('are used through options.shapes; one without the dimensions its checks need is refused', async () => {
    const { lookupWith } = await import('../../../shared/engine/shapes/table');
    const { evaluateDesign } = await import('../../../shared/engine/design');
    // A custom welded W of our own: plates 10 x 6 x 3/8 in flanges, 1/4 in web, no torsional columns.
    const custom = {
      label: 'MYW10',
      family: 'W' as const,
      W: 25,
      A: 6.81,
      d: 10,
      bf: 6,
      tf: 0.375,
      tw: 0.25,
      Ix: 117,
      Sx: 23.4,
      Zx: 26.4,
      Iy: 13.5,
      ry: 1.41,
      J: 0.3,
      custom: true,
    };
    const doc = parsedDesignSchema.parse(memberDoc({ shape: 'MYW10', loads: someLoad }));
    const r = evaluateDesign(doc, { shapes: lookupWith([custom]) });
    expect(r.member.section.label).toBe('MYW10');
    expect(r.checks.every((c) => Number.isFinite(c.ratio))).toBe(true);
    const broken = { ...custom, label: 'BROKEN', tw: undefined };
    const bad = parsedDesignSchema.parse(memberDoc({ shape: 'BROKEN', loads: someLoad }));
    expect(() => evaluateDesign(bad, { shapes: lookupWith([broken]) })).toThrow(/BROKEN lacks tw/);
  });
});
