import { describe, expect, it } from 'vitest';
import { exampleDesign, exampleMemberOnly, exampleTapered } from '../../../shared/engine/examples';
import { CAUTION, ENGINE_VERSION } from '../../../shared/engine/types';
import { check, memberDoc, rel, run } from './design-helpers';

const MEMBER_IDS = [
  'member.flexure',
  'member.shear',
  'member.deflection.live',
  'member.deflection.total',
  'member.vibration',
];

describe('the result document', () => {
  it('carries the caution, the engine version and every member check, ok = every check ok', () => {
    const r = run(exampleMemberOnly);
    expect(r.caution).toBe(CAUTION);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    expect(r.checks.map((c) => c.id)).toEqual(MEMBER_IDS);
    expect(r.ok).toBe(r.checks.every((c) => c.ok));
    expect(r.connection).toBeNull();
    for (const c of r.checks) {
      expect(c.reference.length).toBeGreaterThan(3);
      expect(c.ratio).toBeCloseTo(c.demand!.value / c.capacity!.value, 12);
    }
  });

  it('the demo design with its connection merges the connection checks after the member checks', () => {
    const r = run(exampleDesign);
    expect(r.checks.slice(0, 5).map((c) => c.id)).toEqual(MEMBER_IDS);
    expect(r.checks.length).toBeGreaterThan(5);
    expect(r.checks.slice(5).every((c) => !c.id.startsWith('member.'))).toBe(true);
    expect(r.ok).toBe(r.checks.every((c) => c.ok));
  });

  it('reports the steel used: the family default (REFERENCES.md material defaults [mem]) unless given', () => {
    const w = run(memberDoc({ loads: { selfWeight: true, area: [], line: [], point: [] } }));
    expect(w.member.steel).toEqual({
      grade: 'ASTM A992',
      Fy: { value: 50, unit: 'ksi' },
      E: { value: 29000, unit: 'ksi' },
    });
    const pipe = run(
      memberDoc({ shape: 'Pipe6STD', loads: { selfWeight: true, area: [], line: [], point: [] } }),
    );
    expect(pipe.member.steel!.Fy.value).toBe(35);
    const c = run(
      memberDoc({ shape: 'C10X15.3', loads: { selfWeight: true, area: [], line: [], point: [] } }),
    );
    expect(c.member.steel!.Fy.value).toBe(36);
    const given = run(
      memberDoc({ steel: { Fy: '345 MPa' }, loads: { selfWeight: true, area: [], line: [], point: [] } }),
    );
    expect(given.member.steel!.Fy.value).toBeCloseTo(50.04, 2);
  });

  it('without frequencyMin the vibration row uses the 5 Hz default of EN 1990 Annex A2 A2.4.3.2 [mem], named', () => {
    const r = run(memberDoc({ loads: { selfWeight: true, area: [], line: [], point: [] } }));
    const v = check(r, 'member.vibration');
    expect(v.demand!.value).toBe(5);
    expect(v.reference).toMatch(/EN 1990 Annex A2/);
    expect(v.ratio).toBeCloseTo(5 / r.member.frequency.value, 12);
  });

  it('a frequency below the stated minimum fails member.vibration', () => {
    const r = run(
      memberDoc({ frequencyMin: '70 Hz', loads: { selfWeight: true, area: [], line: [], point: [] } }),
    );
    const v = check(r, 'member.vibration');
    expect(v.ok).toBe(false);
    expect(v.ratio).toBeCloseTo(70 / r.member.frequency.value, 10);
  });

  it('SI results are the same design in kN, m, mm: W12X26 8 ft under 0.4 kip/ft live load', () => {
    const doc = memberDoc({
      loads: { selfWeight: false, area: [], line: [{ case: 'L', value: '0.4 kip/ft' }], point: [] },
    });
    const us = run(doc);
    const si = run({ ...doc, units: 'SI' });
    // 1 kip ft = 1.355818 kN m, 1 kip = 4.448222 kN, 1 in = 25.4 mm (exact definitions).
    expect(si.member.cases.L!.rootMoment.unit).toBe('kN m');
    expect(
      rel(si.member.cases.L!.rootMoment.value, us.member.cases.L!.rootMoment.value * 1.3558179),
    ).toBeLessThan(1e-6);
    expect(
      rel(si.member.cases.L!.rootShear.value, us.member.cases.L!.rootShear.value * 4.4482216),
    ).toBeLessThan(1e-6);
    expect(si.member.cases.L!.tipDeflection.unit).toBe('mm');
    expect(
      rel(si.member.cases.L!.tipDeflection.value, us.member.cases.L!.tipDeflection.value * 25.4),
    ).toBeLessThan(1e-9);
    const tapered = run({ ...exampleTapered, units: 'SI' });
    expect(tapered.member.section.label).toBe('W10X19 tapered to 152 mm');
    expect(run(exampleTapered).member.section.label).toBe('W10X19 tapered to 6 in');
  });

  it('ASD lists the ASCE 7-16 2.4.1 combinations, LRFD the 2.3.1 ones, named as ASCE 7 writes them', () => {
    const loads = {
      selfWeight: true,
      area: [
        { case: 'L' as const, value: '60 psf' },
        { case: 'S' as const, value: '30 psf' },
      ],
      line: [],
      point: [],
    };
    const r = run(memberDoc({ method: 'ASD', loads }));
    expect(r.member.combinations.map((c) => c.name)).toEqual(['D', 'D + L', 'D + S', 'D + 0.75L + 0.75S']);
    const lrfd = run(memberDoc({ loads }));
    expect(lrfd.member.combinations.map((c) => c.name)).toEqual([
      '1.4D',
      '1.2D + 1.6L + 0.5S',
      '1.2D + 1.6S + L',
    ]);
  });

  it('stations: display units, a series per case and per combination, depth along x', () => {
    const r = run(exampleTapered, { stations: true });
    const s = r.stations!;
    expect(s.units).toEqual({ x: 'ft', V: 'kip', M: 'kip ft', deflection: 'in', rotation: 'rad' });
    expect(s.x[0]).toBe(0);
    expect(s.x[s.x.length - 1]).toBeCloseTo(9, 12);
    expect(s.cases.map((c) => c.name)).toEqual(Object.keys(r.member.cases));
    expect(s.combinations.map((c) => c.name)).toEqual(r.member.combinations.map((c) => c.name));
    expect(s.depth[0]).toBeCloseTo(10.2, 6); // W10X19 d = 10.2 in (AISC Shapes Database v15.0)
    expect(s.depth[s.depth.length - 1]).toBeCloseTo(6, 6);
    const D = s.cases.find((c) => c.name === 'D')!;
    expect(D.M[0]).toBeCloseTo(r.member.cases.D!.rootMoment.value, 9);
    expect(D.deflection[D.deflection.length - 1]).toBeCloseTo(r.member.cases.D!.tipDeflection.value, 9);
    expect(D.rotation![0]).toBe(0); // fixed root
    expect(D.rotation!.every((v, i) => i === 0 || v >= D.rotation![i - 1])).toBe(true); // hogging: slope grows toward the tip
    expect(run(exampleTapered).stations).toBeUndefined();
  });
});

describe('checkDocument: schema and engine checks in one call', () => {
  it('returns the result for a valid document and the field issues otherwise, never throwing for bad input', async () => {
    const { checkDocument } = await import('../../../shared/engine/check-document');
    const good = checkDocument(exampleMemberOnly);
    expect(good.ok && good.result.caution).toBe(CAUTION);
    expect(
      checkDocument({ member: { length: '-3 ft', spacing: '4 ft', section: { shape: 'W12X26' } } }),
    ).toEqual({
      ok: false,
      issues: [{ path: 'member.length', message: 'must be a positive length, got "-3 ft"' }],
    });
    expect(
      checkDocument({ member: { length: '3 ft', spacing: '4 ft', section: { shape: 'W99X1' } } }),
    ).toEqual({
      ok: false,
      issues: [{ path: 'member.section.shape', message: 'unknown shape "W99X1": not in the shapes table' }],
    });
  });
});
