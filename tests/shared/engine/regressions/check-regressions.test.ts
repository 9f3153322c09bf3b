/**
 * Regression tests for edge cases the checks once got wrong: rods beside the section, f'c above
 * 10,000 psi, a station outside the clauses, a zero web, a quantity exactly at its limit (each fails
 * on the engine as it was before the fix). Sources are named beside each value; arithmetic is shown.
 */
import { describe, expect, it } from 'vitest';
import { checkConnection } from '../../../../shared/engine/connection/check-connection';
import { pulloutStrength } from '../../../../shared/engine/connection/pullout-blowout';
import { flexureCheck } from '../../../../shared/engine/checks/flexure-check';
import { shearCheck } from '../../../../shared/engine/checks/shear-check';
import type { CheckContext } from '../../../../shared/engine/checks/check-context';
import { readLateralSupport } from '../../../../shared/engine/checks/lateral-support';
import type { Response } from '../../../../shared/engine/member/analysis';
import { analyseMember } from '../../../../shared/engine/member/analysis';
import { builtUpSection } from '../../../../shared/engine/sections/tapered-section';
import { connection, expectWithin, LRFD_US, W12X26_ROOT } from '../../connection/connection-fixtures';
import { toInternal } from '../../../../shared/engine/units';
import { parsedQuantity } from '../../../../shared/schemas/parsed-design';

describe('plate.thickness: rods beside the section, not beyond the tension flange', () => {
  // W12X26 footprint: d 12.2, bf 6.49, tf 0.380 in (AISC Shapes Database v15.0 [pub]).
  // Rows at f = 4 in with a 16 in gauge: the rods sit at y = +-8 in, beside the flange tips
  // (bf/2 = 3.245 in), inside the section depth (d/2 = 6.1 in). Before the fix the DG1 lever
  // x = f - d/2 + tf/2 = 4 - 6.1 + 0.19 = -1.91 in was clamped to 0, so the 48 kip of row tension
  // needed no plate at all and a 1.75 in plate passed on the bearing side alone.
  const input = connection({
    plate: { N: '16 in', B: '24 in', thickness: '1.75 in' },
    anchors: { offset: '4 in', gauge: '16 in', perSide: 2 },
  });
  const out = checkConnection(input, [{ combination: 'test', M: 600, V: 5, H: 0 }], W12X26_ROOT, LRFD_US);
  const find = (id: string) => out.checks.find((c) => c.id === id)!;

  it('the rods carry tension (DG1 large moment, recomputed here)', () => {
    // DG1 (2nd ed.) 3.4 [mem]: e = M/P = 600/5 = 120 in; sqrt(A2/A1) = min(36/16, 36/24) = 1.5 (J8);
    // fp,max = 0.65 x 0.85 x 4 ksi x 1.5 = 3.315 ksi; qmax = 3.315 x 24 = 79.56 kip/in;
    // e_crit = N/2 - P/(2 qmax) = 8 - 5/159.12 = 7.97 in < e: large moment.
    const qmax = 0.65 * 0.85 * 4 * 1.5 * 24;
    const A = 4 + 16 / 2; // f + N/2
    const Y = A - Math.sqrt(A * A - (2 * (600 + 5 * 4)) / qmax); // Y = 0.668 in
    const T = qmax * Y - 5; // T = 48.1 kip on the tension row
    expect(T).toBeGreaterThan(40);
    // anchors.steelTension carries one rod's share, T / 2.
    expectWithin(find('anchors.steelTension').demand!.value, T / 2, 1e-9);
  });

  it('describes no plate in the result (nothing to schedule for the fabricator)', () => {
    expect(out.result).toBeNull();
  });

  it('fails plate.thickness as not computed instead of passing with a zero tension-side requirement', () => {
    const t = find('plate.thickness');
    expect(t.ok).toBe(false);
    expect(t.ratio).toBeNull();
    expect(t.note).toMatch(/not beyond the tension flange/);
  });

  it('leaves a row beyond the flange alone: f = 8 in gives x = 8 - 6.1 + 0.19 = 2.09 in (DG1 3.4 [mem])', () => {
    const beyond = checkConnection(
      connection(),
      [{ combination: 'test', M: 600, V: 5, H: 0 }],
      W12X26_ROOT,
      LRFD_US,
    );
    const t = beyond.checks.find((c) => c.id === 'plate.thickness')!;
    expect(t.ratio).not.toBeNull();
    expectWithin((beyond.result!.tensionLever as { value: number }).value, 8 - 12.2 / 2 + 0.38 / 2, 1e-9);
  });
});

describe("pullout: f'c is capped at 10,000 psi like every ch. 17 calculation (ACI 318-19 17.3.1, from memory)", () => {
  it('12,000 psi concrete gives Np = 8 x 0.911 in^2 x 10,000 psi = 72,880 lb, not 87,456 lb', () => {
    // Abrg 0.911 in^2: heavy hex nut of a 3/4 in rod (REFERENCES.md [calc]); ACI 318-19 17.6.3.2.2 [mem].
    const np = pulloutStrength(0.911, { fc: 12, lambdaA: 1, cracked: true });
    expectWithin(np * 1000, 8 * 0.911 * 10000, 1e-9);
  });
});

/**
 * A built-up taper whose deep root web is beyond the F13.2 limit h/tw <= min(260, 0.40 E/Fy) = 232
 * (AISC 360-16 F13.2 [mem], Fy 50): root 60 in, tw 0.24 in, flanges 6 x 3/8: h/tw = (60 - 0.75)/0.24 = 247.
 */
function taperContext(M: (x: number) => number): CheckContext {
  const section = builtUpSection({
    rootDepth: 60,
    tipDepth: 8,
    flangeWidth: 6,
    flangeThickness: 0.375,
    webThickness: 0.24,
  });
  const L = 240;
  const model = analyseMember(section, L, 29000, [{ case: 'L', q0: 0.001, q1: 0, points: [] }], 40);
  const x = model.grid.x;
  // A moment diagram written by hand (kip-in), to place the worst ratio where the test needs it.
  const response: Response = {
    V: Float64Array.from(x, () => 1),
    M: Float64Array.from(x, M),
    theta: new Float64Array(0),
    y: new Float64Array(0),
    tip: 0,
  };
  return {
    model,
    section,
    method: 'LRFD',
    units: 'US',
    Fy: 50,
    E: 29000,
    Lb: 12,
    combos: [{ name: '1.6L', factors: { L: 1.6 }, response }],
    signed: false,
    lateral: readLateralSupport({
      length: parsedQuantity('1 ft', 'length'),
      spacing: parsedQuantity('1 ft', 'length'),
      section: { shape: 'W12X26' },
    }),
  };
}

describe('member.flexure: a station outside the clauses fails the check wherever the worst ratio is', () => {
  it('root beyond F13.2 with the worst ratio elsewhere: ok is false and the note names the root', () => {
    // Moment zero at the root and 50 kip-in elsewhere: the worst ratio is away from the root, where
    // the web is within F13.2; before the fix only that station's scope was looked at, and it passed.
    const ctx = taperContext((x) => (x === 0 ? 0 : 50));
    const c = flexureCheck(ctx);
    expect(c.at!.value).toBeGreaterThan(0);
    expect(c.ratio!).toBeLessThan(1);
    expect(c.ok).toBe(false);
    expect(c.note).toMatch(/F13\.2/);
    expect(c.note).toMatch(/at 0 ft from the root/);
  });

  it('a web within F13.2 everywhere still passes (tw 0.30 in: h/tw = 59.25/0.30 = 198 < 232)', () => {
    const ctx = taperContext((x) => (x === 0 ? 0 : 50));
    const section = builtUpSection({
      rootDepth: 60,
      tipDepth: 8,
      flangeWidth: 6,
      flangeThickness: 0.375,
      webThickness: 0.3,
    });
    const props = ctx.model.grid.x.map((xi) => section.at(xi / ctx.model.L));
    expect(flexureCheck({ ...ctx, section, model: { ...ctx.model, props } }).ok).toBe(true);
  });
});

describe('member.shear: a station with no shear strength is a failed check, never a silent pass', () => {
  it('a (corrupt) zero web thickness at one station gives ratio null and ok false', () => {
    const ctx = taperContext(() => 10);
    const props = ctx.model.props.map((p, i) => (i === 3 ? { ...p, tw: 0 } : p));
    const c = shearCheck({ ...ctx, model: { ...ctx.model, props } });
    expect(c.ratio).toBeNull();
    expect(c.ok).toBe(false);
  });
});

describe('quantities read exactly: a rod exactly at the required plate edge distance passes', () => {
  it('"12 in" is 12 in, not 11.999999999999998 (mathjs converts through metres)', () => {
    expect(toInternal('12 in', 'length')).toBe(12);
    expect(toInternal('304.8 mm', 'length')).toBe(12);
    expect(toInternal('1-1/2 in', 'length')).toBe(1.5);
  });

  it('B 12 in, gauge 9 in, 1 in rods: 12/2 - 9/2 = 1.5 in = max(1.5 da, hole/2 + 1/2, washer/2) = 1.5 in (common practice, no source)', () => {
    const input = connection({ plate: { N: '20 in', B: '12 in' }, anchors: { gauge: '9 in' } });
    const out = checkConnection(input, [{ combination: 'test', M: 100, V: 5, H: 0 }], W12X26_ROOT, LRFD_US);
    const layout = out.checks.find((c) => c.id === 'anchors.layout')!;
    expect(layout.ratio).toBe(1);
    expect(layout.ok).toBe(true);
  });
});
