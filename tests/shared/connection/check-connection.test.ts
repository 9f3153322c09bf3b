import { describe, expect, it } from 'vitest';
import { checkConnection } from '../../../shared/engine/connection/check-connection';
import {
  availableBearingStress,
  confinementFactor,
  solveBearing,
} from '../../../shared/engine/connection/bearing';
import type { Check } from '../../../shared/engine/types';
import {
  ASD_US,
  DEMANDS,
  LRFD_US,
  W12X26_ROOT,
  connection,
  expectWithin,
  numbersIn,
} from './connection-fixtures';

function byId(checks: Check[], id: string): Check {
  const c = checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id} in ${checks.map((x) => x.id).join(', ')}`);
  return c;
}

const STABLE = [
  'plate.geometry',
  'anchors.layout',
  'plate.bearing',
  'plate.thickness',
  'anchors.steelTension',
  'anchors.concreteBreakout',
  'anchors.pullout',
  'anchors.shear',
  'anchors.interaction',
];

describe('checkConnection, a post-base plate of our scenario', () => {
  const { result, checks } = checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US);

  it('reports every stable check once, each passing, with its governing combination', () => {
    expect(checks.map((c) => c.id).sort()).toEqual([...STABLE].sort());
    for (const c of checks) {
      expect(c.ok, `${c.id}: ${c.note ?? ''}`).toBe(true);
      expect(c.ratio).not.toBeNull();
      if (c.id === 'plate.geometry' || c.id === 'anchors.layout') expect(c.combination).toBeNull();
      else expect(DEMANDS.map((d) => d.combination)).toContain(c.combination);
    }
    // No rod within hef/2.5 of an edge here, so side-face blowout does not apply (ACI 318-19 17.6.4.1).
    expect(checks.some((c) => c.id === 'anchors.sideFaceBlowout')).toBe(false);
  });

  it('puts the DG1 bearing block of the governing combination in the result', () => {
    expect(result).not.toBeNull();
    const d = DEMANDS.find((x) => x.combination === result?.combination);
    expect(d).toBeDefined();
    const fpMax = availableBearingStress(4, confinementFactor(20, 16, 36, 36), 'LRFD');
    const s = solveBearing({ N: 20, B: 16, f: 8, P: d?.V ?? 0, M: d?.M ?? 0, fpMax });
    expect(result?.case).toBe(s.case);
    expectWithin(result?.bearingLength.value, s.Y as number, 1e-9);
    expect(result?.bearingLength.unit).toBe('in');
    expectWithin(result?.anchorTensionPerRod.value, (s.T as number) / 2, 1e-9);
    expect(result?.anchorTensionPerRod.unit).toBe('kip');
    expect(result?.requiredThickness.value).toBeGreaterThan(0);
    expect(numbersIn(result).every(Number.isFinite)).toBe(true);
  });

  it('uses friction for the small horizontal force (DG1 4.1)', () => {
    expect(byId(checks, 'anchors.shear').reference).toMatch(/friction/);
  });

  it('names the governing plate combination: a third, larger moment takes over', () => {
    const more = [...DEMANDS, { combination: 'extra', M: 600, V: 7, H: 0 }];
    const r = checkConnection(connection(), more, W12X26_ROOT, LRFD_US);
    expect(r.result?.combination).toBe('extra');
    expect(byId(r.checks, 'plate.thickness').combination).toBe('extra');
    expect(byId(r.checks, 'anchors.steelTension').combination).toBe('extra');
  });
});

describe('checkConnection, face plate on a pier face', () => {
  const input = connection({ arrangement: 'face-plate' });
  const { result, checks } = checkConnection(input, DEMANDS, W12X26_ROOT, LRFD_US);

  it('takes the vertical reaction as shear on the rods, never friction', () => {
    const shear = byId(checks, 'anchors.shear');
    expect(shear.reference).toMatch(/ACI 318-19 17\.7/);
    expectWithin(shear.demand?.value, 6.9, 1e-12);
  });

  it('bears at fp,max with P = 0 (large moment)', () => {
    expect(result?.case).toBe('large-moment');
    const fpMax = availableBearingStress(4, confinementFactor(20, 16, 36, 36), 'LRFD');
    expectWithin(result?.bearingPressure.value, fpMax, 1e-12);
  });
});

describe('checkConnection fails loudly on impossible geometry', () => {
  it('a plate too small for the moment: no real bearing length, nothing downstream passes', () => {
    const input = connection({
      plate: { N: '14 in', B: '8 in' },
      anchors: { offset: '5 in', gauge: '5 in' },
    });
    const { result, checks } = checkConnection(
      input,
      [{ combination: 'big', M: 4000, V: 1, H: 0 }],
      W12X26_ROOT,
      LRFD_US,
    );
    const bearing = byId(checks, 'plate.bearing');
    expect(bearing.ok).toBe(false);
    expect(bearing.ratio).toBeGreaterThan(1);
    expect(bearing.note).toMatch(/No real bearing length.*longer plate/);
    for (const id of [
      'plate.thickness',
      'anchors.steelTension',
      'anchors.concreteBreakout',
      'anchors.pullout',
      'anchors.interaction',
    ]) {
      const c = byId(checks, id);
      expect(c.ok, id).toBe(false);
      expect(c.ratio, id).toBeNull();
      expect(c.note, id).toBeTruthy();
    }
    expect(result).toBeNull();
  });

  it('rods beyond the plate edge fail the layout with the reason and a fix', () => {
    const { checks } = checkConnection(
      connection({ anchors: { offset: '11 in' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    const layout = byId(checks, 'anchors.layout');
    expect(layout.ok).toBe(false);
    expect(layout.ratio).toBeNull();
    expect(layout.note).toMatch(/Rod centre to plate edge along N.*longer plate/);
  });

  it("writes the layout note in the person's units", () => {
    const { checks } = checkConnection(connection({ anchors: { offset: '9.5 in' } }), DEMANDS, W12X26_ROOT, {
      ...LRFD_US,
      units: 'SI',
    });
    // Rod centre to plate edge: has 0.5 in = 12.7 mm (mathjs conversion); needs 1.5 in = 38.1 mm (1 in rod).
    expect(byId(checks, 'anchors.layout').note).toMatch(/needs 38\.1 mm, has 12\.7 mm/);
  });

  it('rods outside the pier: the concrete checks are not computed and fail', () => {
    // A face plate, so that the shear goes to the rods (a post-base plate would use friction).
    const input = connection({
      arrangement: 'face-plate',
      plate: { N: '30 in' },
      anchors: { offset: '13 in' },
      pier: { length: '24 in' },
    });
    const { checks } = checkConnection(input, DEMANDS, W12X26_ROOT, LRFD_US);
    expect(byId(checks, 'plate.geometry').ok).toBe(false);
    for (const id of ['anchors.concreteBreakout', 'anchors.shear']) {
      expect(byId(checks, id).ok).toBe(false);
      expect(byId(checks, id).note).toMatch(/outside the pier/);
    }
  });

  it('a rod size outside DG1 Table 2.3 is refused, not guessed', () => {
    const { checks } = checkConnection(
      connection({ anchors: { diameter: '1-1/8 in' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    expect(byId(checks, 'anchors.layout').note).toMatch(/Table 2\.3/);
    expect(byId(checks, 'anchors.steelTension').ok).toBe(false);
  });

  it('an unknown footprint shape fails the plate geometry and the thickness', () => {
    const { checks } = checkConnection(
      connection({ footprint: { shape: 'W99X1' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    expect(byId(checks, 'plate.geometry').note).toMatch(/W99X1/);
    expect(byId(checks, 'plate.thickness').ok).toBe(false);
  });

  it('rods too close together when torqued (6 da, ACI 318-19 17.9.2 from memory) but fine untorqued (4 da)', () => {
    const loose = checkConnection(
      connection({ anchors: { gauge: '5.5 in' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    const tight = checkConnection(
      connection({ anchors: { gauge: '5.5 in', torqued: true } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    expect(byId(loose.checks, 'anchors.layout').ok).toBe(true);
    expect(byId(tight.checks, 'anchors.layout').ok).toBe(false);
    expect(byId(tight.checks, 'anchors.layout').note).toMatch(/Rod spacing in a row/);
  });

  it('an embedment deeper than the pier is a failed layout', () => {
    const { checks } = checkConnection(
      connection({ pier: { depth: '12 in' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    expect(byId(checks, 'anchors.layout').note).toMatch(/Pier depth/);
  });

  it('no combination at all is a failed check, not a silent pass', () => {
    const { result, checks } = checkConnection(connection(), [], W12X26_ROOT, LRFD_US);
    expect(result).toBeNull();
    expect(byId(checks, 'connection.demand').ok).toBe(false);
  });
});

describe('checkConnection options', () => {
  it('emits side-face blowout when the rods are deep and near an edge (hef > 2.5 ca1)', () => {
    // Pier 24 in long: 4 in from the tension row to the edge; hef 12 > 2.5 x 4.
    const { checks } = checkConnection(
      connection({ pier: { length: '24 in' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    );
    const b = byId(checks, 'anchors.sideFaceBlowout');
    expect(b.ratio).not.toBeNull();
    expect(b.note).toMatch(/hef > 2\.5 ca1/);
  });

  it('supplementary reinforcement raises breakout by 0.75/0.70 (ACI 318-19 Table 17.5.3, condition A)', () => {
    const b = byId(
      checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).checks,
      'anchors.concreteBreakout',
    );
    const a = byId(
      checkConnection(
        connection({ anchors: { supplementaryReinforcement: true } }),
        DEMANDS,
        W12X26_ROOT,
        LRFD_US,
      ).checks,
      'anchors.concreteBreakout',
    );
    expectWithin(a.capacity?.value, ((b.capacity?.value as number) * 0.75) / 0.7, 1e-12);
  });

  it('lightweight concrete scales breakout by lambda (ACI 318-19 17.2.4)', () => {
    const nw = byId(
      checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).checks,
      'anchors.concreteBreakout',
    );
    const lw = byId(
      checkConnection(connection({ concrete: { lambda: 0.75 } }), DEMANDS, W12X26_ROOT, LRFD_US).checks,
      'anchors.concreteBreakout',
    );
    expectWithin(lw.capacity?.value, 0.75 * (nw.capacity?.value as number), 1e-12);
  });

  it('ASD: AISC rod tension Rn/2.00 against ACI phi Nsa/1.6, and the governing clause is named', () => {
    // 1 in Gr 36: AISC phi Rn = 0.5625 x 58 x 0.7854 = 25.62 kip < ACI 0.75 x 0.606 x 58 = 26.36 kip (LRFD);
    // ASD: AISC 17.08 kip > ACI 26.36/1.6 = 16.48 kip, so ACI governs [calc].
    const lrfd = byId(
      checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).checks,
      'anchors.steelTension',
    );
    const asd = byId(
      checkConnection(connection(), DEMANDS, W12X26_ROOT, ASD_US).checks,
      'anchors.steelTension',
    );
    expectWithin(lrfd.capacity?.value, 25.62, 0.001);
    expect(lrfd.reference).toMatch(/^AISC 360-16 J3\.6 \(governs\)/);
    expectWithin(asd.capacity?.value, 16.48, 0.002);
    expect(asd.reference).toMatch(/^ACI 318-19 17\.6\.1 \(governs\)/);
  });

  it('ASD: ACI concrete capacities are phi Nn / 1.6 (METHOD.md; common practice, from memory)', () => {
    const lrfd = checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).checks;
    const asd = checkConnection(connection(), DEMANDS, W12X26_ROOT, ASD_US).checks;
    for (const id of ['anchors.concreteBreakout', 'anchors.pullout']) {
      expectWithin(byId(asd, id).capacity?.value, (byId(lrfd, id).capacity?.value as number) / 1.6, 1e-12);
    }
  });

  it('SI results are the same numbers in mm and kN (mathjs conversion)', () => {
    const us = checkConnection(connection(), DEMANDS, W12X26_ROOT, LRFD_US).result;
    const si = checkConnection(connection(), DEMANDS, W12X26_ROOT, { ...LRFD_US, units: 'SI' }).result;
    expect(si?.requiredThickness.unit).toBe('mm');
    expectWithin(si?.requiredThickness.value, (us?.requiredThickness.value as number) * 25.4, 1e-9);
    expect(si?.anchorTensionPerRod.unit).toBe('kN');
    expectWithin(si?.anchorTensionPerRod.value, (us?.anchorTensionPerRod.value as number) * 4.4482216, 1e-6);
  });

  it('an HSS footprint uses 0.95 of its width for n, a pipe 0.8 of its diameter both ways (DG1 3.1 [mem])', () => {
    const hss = checkConnection(
      connection({ footprint: { shape: 'HSS8X8X1/2' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    ).result;
    expectWithin((hss?.n as { value: number }).value, (16 - 0.95 * 8) / 2, 1e-12);
    const pipe = checkConnection(
      connection({ footprint: { shape: 'Pipe6STD' } }),
      DEMANDS,
      W12X26_ROOT,
      LRFD_US,
    ).result;
    expectWithin((pipe?.m as { value: number }).value, (20 - 0.8 * 6.625) / 2, 1e-12);
    expectWithin((pipe?.n as { value: number }).value, (16 - 0.8 * 6.625) / 2, 1e-12);
  });

  it('a horizontal force beyond friction goes to the rods in shear', () => {
    const { checks } = checkConnection(
      connection(),
      [{ combination: 'push', M: 200, V: 2, H: 5 }],
      W12X26_ROOT,
      LRFD_US,
    );
    const shear = byId(checks, 'anchors.shear');
    expect(shear.reference).toMatch(/ACI 318-19 17\.7/);
    expectWithin(shear.demand?.value, 5, 1e-12);
  });
});
