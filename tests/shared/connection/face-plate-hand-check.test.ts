/**
 * A face-plate design checked end to end by hand: member statics (AISC Manual Table 3-23), the DG1
 * bearing block and plate thickness, and the ACI 318-19 ch. 17 rod checks with the pier's edges.
 * Every expected value is computed here from the published equation, with the arithmetic shown;
 * none is copied from the engine. Also: the same design in ASD, and written in SI units.
 */
import { describe, expect, it } from 'vitest';
import type { DesignDocument } from '../../../shared/schemas/design';
import { convert } from '../../../shared/engine/units';
import { check, memberDoc, rel, run } from '../engine/design-helpers';

// W12X26 (AISC Shapes Database v15.0 [pub]): d 12.2, bf 6.49, tf 0.380, tw 0.230 in.
const d = 12.2;
const bf = 6.49;
const tf = 0.38;
const rootFc = Math.sqrt(4000); // lambda_a sqrt(f'c), psi: 63.246
// 1 in rod (REFERENCES.md [pub]/[mem]): Ase 0.606 in^2 (ASTM F1554 UNC stress area), Ab = pi/4 = 0.7854 in^2;
// heavy hex nut across flats 1.5 da + 1/8 = 1.625 in (ASME B18.2.2, from memory): Abrg = 0.866 x 1.625^2 - 0.7854 = 1.5014 in^2.
const Ase = (Math.PI / 4) * (1 - 0.9743 / 8) ** 2;
const Ab = Math.PI / 4;
const Abrg = (Math.sqrt(3) / 2) * 1.625 ** 2 - Ab;

/** 8 ft W12X26, D 0.3 kip/ft and L 0.4 kip/ft (REFERENCES.md worked example), on a face plate. */
function doc(method: 'LRFD' | 'ASD', pierWidth = '48 in', embedment = '12 in'): DesignDocument {
  return {
    ...memberDoc({
      method,
      loads: {
        selfWeight: false,
        area: [],
        line: [
          { case: 'D', value: '0.3 kip/ft' },
          { case: 'L', value: '0.4 kip/ft' },
        ],
        point: [],
      },
    }),
    connection: {
      arrangement: 'face-plate',
      plate: { N: '18 in', B: '12 in', thickness: '1 in', Fy: '36 ksi' },
      anchors: {
        perSide: 2,
        diameter: '1 in',
        grade: 'F1554-36',
        offset: '7.5 in',
        gauge: '9 in',
        embedment,
      },
      concrete: { fc: '4000 psi', cracked: true },
      pier: { length: '36 in', width: pierWidth },
    },
  };
}

describe('face plate, LRFD, a wide wall face: top row breakout with one near edge', () => {
  const r = run(doc('LRFD'));
  // Table 3-23 [mem]: M = wL^2/2, V = wL; 1.2D + 1.6L: w = 1.2 x 0.3 + 1.6 x 0.4 = 1.00 kip/ft:
  // Mu = 1.00 x 8^2/2 = 32.0 kip-ft = 384 kip-in, Vu = 8.0 kip (REFERENCES.md [calc]).
  const Mu = 384;
  const Vu = 8;
  // J8 [mem]: sqrt(A2/A1) = min(36/18, 48/12) = 2 (<= 2); fp,max = 0.65 x 0.85 x 4 x 2 = 4.42 ksi; qmax = 4.42 x 12 = 53.04 kip/in.
  const fpMax = 0.65 * 0.85 * 4 * 2;
  const qmax = fpMax * 12;
  // DG1 3.4 [mem], P = 0: Y = (f + N/2) - sqrt((f + N/2)^2 - 2 M/qmax) = 16.5 - sqrt(272.25 - 14.480) = 0.4448 in.
  const A = 7.5 + 9;
  const Y = A - Math.sqrt(A * A - (2 * Mu) / qmax);
  const T = qmax * Y; // 23.59 kip on the top row, 11.80 kip per rod

  it('member root demand and the governing combination', () => {
    const flex = check(r, 'member.flexure');
    expect(flex.combination).toBe('1.2D + 1.6L');
    expect(rel(flex.demand!.value, Mu / 12)).toBeLessThan(1e-9);
    expect(rel(check(r, 'member.shear').demand!.value, Vu)).toBeLessThan(1e-9);
  });

  it('DG1 bearing length, row tension and the large-moment case', () => {
    expect(Y).toBeCloseTo(0.4448, 3);
    const c = r.connection!;
    expect(c.combination).toBe('1.2D + 1.6L');
    expect(c.case).toBe('large-moment');
    expect(rel(c.bearingLength.value, Y)).toBeLessThan(1e-9);
    expect(rel(c.bearingPressure.value, fpMax)).toBeLessThan(1e-9);
    expect(rel(c.anchorTensionPerRod.value, T / 2)).toBeLessThan(1e-9);
  });

  it('plate thickness: m, n, partial bearing (Y < m, n) and the tension side (DG1 3.3-3.4 [mem])', () => {
    const m = (18 - 0.95 * d) / 2; // (18 - 11.59)/2 = 3.205 in
    const n = (12 - 0.8 * bf) / 2; // (12 - 5.192)/2 = 3.404 in
    const x = 7.5 - d / 2 + tf / 2; // 7.5 - 6.1 + 0.19 = 1.59 in
    const tm = 2.11 * Math.sqrt((fpMax * Y * (m - Y / 2)) / 36); // 0.852 in
    const tn = 2.11 * Math.sqrt((fpMax * Y * (n - Y / 2)) / 36); // 0.880 in (governs)
    const tt = 2.11 * Math.sqrt((T * x) / (12 * 36)); // 0.622 in
    const t = check(r, 'plate.thickness');
    expect(rel(t.demand!.value, Math.max(tm, tn, tt))).toBeLessThan(1e-9);
    expect(tn).toBeGreaterThan(tm);
    expect(t.ok).toBe(true);
  });

  it('rod steel: AISC J3.6 0.75 x 0.75 x 58 x 0.7854 = 25.62 kip < ACI 0.75 x 0.606 x 58 = 26.36 kip', () => {
    const aisc = 0.75 * 0.75 * 58 * Ab;
    const aci = 0.75 * Ase * 58;
    expect(aisc).toBeLessThan(aci);
    const s = check(r, 'anchors.steelTension');
    expect(rel(s.capacity!.value, aisc)).toBeLessThan(1e-9);
    expect(rel(s.demand!.value, T / 2)).toBeLessThan(1e-9);
  });

  it('breakout of the top row (ACI 318-19 17.6.2 [mem]) with the top edge 10.5 in away', () => {
    // Edges from the top row: beyond 36/2 - 7.5 = 10.5 in, across 18 + 7.5 = 25.5 in, sides 24 - 4.5 = 19.5 in.
    // hef 12 in: 1.5 hef = 18 in; only the top edge is near (no narrow-member rule).
    const ANc = (10.5 + 18) * (9 + 18 + 18); // 28.5 x 45 = 1282.5 in^2
    const ANco = 9 * 12 * 12; // 1296 in^2
    const psiEd = 0.7 + (0.3 * 10.5) / 18; // 0.875
    // 11 <= hef <= 25: min(24 sqrt(f'c) hef^1.5, 16 sqrt(f'c) hef^(5/3)) = min(63,097, 63,650) lb
    const Nb = Math.min(24 * rootFc * 12 ** 1.5, 16 * rootFc * 12 ** (5 / 3)) / 1000;
    const phiNcbg = 0.7 * (ANc / ANco) * psiEd * 1.0 * Nb; // cracked psi_c,N 1.0; phi 0.70 condition B
    const b = check(r, 'anchors.concreteBreakout');
    expect(rel(b.capacity!.value, phiNcbg)).toBeLessThan(1e-9);
    expect(rel(b.demand!.value, T)).toBeLessThan(1e-9);
  });

  it('pullout per rod: 0.70 x 8 x 1.5014 x 4 = 33.6 kip (17.6.3 [mem]); no side-face blowout (hef 12 < 2.5 x 10.5)', () => {
    expect(rel(check(r, 'anchors.pullout').capacity!.value, 0.7 * 8 * Abrg * 4)).toBeLessThan(1e-9);
    expect(r.checks.some((c) => c.id === 'anchors.sideFaceBlowout')).toBe(false);
  });

  it('shear toward the bottom edge: breakout of the bottom row governs (17.7.2 [mem])', () => {
    // ca1 = 10.5 in; ca2 = 19.5 in >= 1.5 ca1 = 15.75: psi_ed,V = 1; le = min(12, 8 da) = 8 in:
    // 7 (8/1)^0.2 sqrt(1) = 10.6 > 9, so Vb = 9 sqrt(f'c) ca1^1.5 = 9 x 63.246 x 34.02 = 19,367 lb.
    const ca1 = 10.5;
    const Vb = Math.min(7 * 8 ** 0.2 * rootFc * ca1 ** 1.5, 9 * rootFc * ca1 ** 1.5) / 1000;
    const AVc = (9 + 1.5 * ca1 * 2) * 1.5 * ca1; // (9 + 31.5) x 15.75 = 637.9 in^2 (deep pier)
    const AVco = 4.5 * ca1 * ca1; // 496.1 in^2
    const phiVcbg = 0.7 * (AVc / AVco) * Vb;
    // Steel: 4 rods x 0.65 x 0.6 x 0.606 x 58 = 54.8 kip (no grout pad on a face); pryout 2 Ncbg of all 4 rods is larger.
    const steel = 4 * 0.65 * 0.6 * Ase * 58;
    expect(steel).toBeGreaterThan(phiVcbg);
    const v = check(r, 'anchors.shear');
    expect(rel(v.capacity!.value, phiVcbg)).toBeLessThan(1e-9);
    expect(rel(v.demand!.value, Vu)).toBeLessThan(1e-9);
    expect(v.reference).toMatch(/17\.7\.2/);
  });

  it('interaction 17.8 [mem]: (N + V)/1.2 with N the worst tension ratio', () => {
    const n = Math.max(
      ...['anchors.steelTension', 'anchors.concreteBreakout', 'anchors.pullout'].map(
        (id) => check(r, id).ratio!,
      ),
    );
    const v = check(r, 'anchors.shear').ratio!;
    expect(n).toBeGreaterThan(0.2);
    expect(v).toBeGreaterThan(0.2);
    expect(rel(check(r, 'anchors.interaction').ratio!, (n + v) / 1.2)).toBeLessThan(1e-12);
  });
});

describe('face plate on a narrow pier: ACI 318-19 17.6.2.1.2 and 17.6.4 apply', () => {
  // Pier 36 x 14 in: edges from the top row: beyond 10.5, across 25.5, sides 7 - 4.5 = 2.5 in.
  // hef 12: 1.5 hef = 18: three edges nearer (10.5, 2.5, 2.5) -> narrow member.
  const r = run(doc('LRFD', '14 in', '12 in'));

  it("breakout with hef' = max(ca,max/1.5, s/3) = max(10.5/1.5, 9/3) = 7.0 in", () => {
    const h = Math.max(10.5 / 1.5, 9 / 3); // 7.0 in
    const reach = 1.5 * h; // 10.5 in
    const ANc = (Math.min(10.5, reach) + Math.min(25.5, reach)) * (9 + 2.5 + 2.5); // 21 x 14 = 294 in^2
    const ANco = 9 * h * h; // 441 in^2
    const psiEd = 0.7 + (0.3 * 2.5) / reach; // 0.7714
    const Nb = (24 * rootFc * h ** 1.5) / 1000; // hef' < 11 in: 24 form only; 28.11 kip
    const phiNcbg = 0.7 * (ANc / ANco) * psiEd * Nb;
    const b = check(r, 'anchors.concreteBreakout');
    expect(rel(b.capacity!.value, phiNcbg)).toBeLessThan(1e-9);
    expect(b.note).toMatch(/17\.6\.2\.1\.2/);
  });

  it('side-face blowout of the end rod, 2.5 in from the side face (hef 12 > 2.5 x 2.5)', () => {
    // ca1 = 2.5, ca2 = 10.5 >= 3 ca1 = 7.5: no corner reduction; Nsb = 160 ca1 sqrt(Abrg) sqrt(f'c)
    // = 160 x 2.5 x 1.2253 x 63.246 = 31.0 kip; phi 0.70; against one rod's tension.
    const nsb = (160 * 2.5 * Math.sqrt(Abrg) * rootFc) / 1000;
    const sfb = check(r, 'anchors.sideFaceBlowout');
    expect(rel(sfb.capacity!.value, 0.7 * nsb)).toBeLessThan(1e-9);
    expect(rel(sfb.demand!.value, r.connection!.anchorTensionPerRod.value)).toBeLessThan(1e-9);
  });

  it('confinement falls to sqrt(A2/A1) = min(36/18, 14/12) = 1.167 (J8)', () => {
    expect(r.connection!.confinementFactor).toBeCloseTo(14 / 12, 12);
  });
});

describe('the same face plate in ASD (ASCE 7-16 2.4.1, Omega factors, ACI phi/1.6)', () => {
  const r = run(doc('ASD'));
  // D + L: w = 0.7 kip/ft: Ma = 0.7 x 64/2 = 22.4 kip-ft = 268.8 kip-in; Va = 5.6 kip.
  const Ma = 268.8;
  const fpMax = (0.85 * 4 * 2) / 2.31; // Omega_c 2.31: 2.944 ksi
  const qmax = fpMax * 12;
  const A = 16.5;
  const Y = A - Math.sqrt(A * A - (2 * Ma) / qmax);
  const T = qmax * Y;

  it('flexure Mn/Omega with Mn = 138.9 kip-ft (REFERENCES.md [calc]) recomputed from F2-2', () => {
    // Lp = 1.76 ry sqrt(E/Fy) = 1.76 x 1.51 x 24.08 = 64.0 in; Lr from F2-6 with c = 1.
    const E = 29000;
    const Lp = 1.76 * 1.51 * Math.sqrt(E / 50);
    const jc = 0.3 / (33.4 * 11.8);
    const Lr = 1.95 * 1.75 * (E / 35) * Math.sqrt(jc + Math.sqrt(jc * jc + 6.76 * (35 / E) ** 2));
    const Mp = 50 * 37.2;
    const Mn = Mp - (Mp - 0.7 * 50 * 33.4) * ((96 - Lp) / (Lr - Lp));
    expect(Mn / 12).toBeCloseTo(138.9, 1);
    const f = check(r, 'member.flexure');
    expect(f.combination).toBe('D + L');
    expect(rel(f.capacity!.value, Mn / 1.67 / 12)).toBeLessThan(1e-9);
    expect(rel(f.demand!.value, Ma / 12)).toBeLessThan(1e-9);
  });

  it('bearing and thickness with the ASD coefficients 2.58 (DG1 [mem])', () => {
    expect(rel(r.connection!.bearingLength.value, Y)).toBeLessThan(1e-9);
    const n = (12 - 0.8 * bf) / 2;
    const m = (18 - 0.95 * d) / 2;
    const x = 7.5 - d / 2 + tf / 2;
    const req = Math.max(
      2.58 * Math.sqrt((fpMax * Y * (n - Y / 2)) / 36),
      2.58 * Math.sqrt((fpMax * Y * (m - Y / 2)) / 36),
      2.58 * Math.sqrt((T * x) / (12 * 36)),
    );
    expect(rel(check(r, 'plate.thickness').demand!.value, req)).toBeLessThan(1e-9);
  });

  it('rod steel in an ASD design is checked on the strength combinations: AISC 0.75 x 0.75 x 58 x 0.7854 = 25.62 kip governs over ACI 0.75 x 0.606 x 58 = 26.36 kip', () => {
    // ACI 318 ch. 17 is strength design; since engine 2.0.0 the rods of an ASD design are checked with phi on
    // the ASCE 7 strength combinations (the older phi Rn / 1.6 was not conservative for every combination).
    const aisc = 0.75 * 0.75 * 58 * Ab;
    const aci = 0.75 * Ase * 58;
    expect(aisc).toBeLessThan(aci);
    const s = check(r, 'anchors.steelTension');
    expect(rel(s.capacity!.value, aisc)).toBeLessThan(1e-9);
    expect(s.combination).toBe('1.2D + 1.6L');
    expect(s.note).toMatch(/strength combinations/);
  });
});

describe('the same design written in SI gives the same physical answers', () => {
  // Exact conversions: 1 ft = 0.3048 m, 1 in = 25.4 mm, 1 kip = 4.4482216152605 kN, 1 psi = 6.894757293168 kPa.
  // mathjs 15 defines the kip as 4448.2216 N (a 3.4e-9 truncation of 1000 lbf), so agreement is to 1e-8.
  const kipPerFt = (v: number) => `${((v * 4.4482216152605) / 0.3048).toPrecision(15)} kN/m`;
  const si: DesignDocument = {
    units: 'SI',
    method: 'LRFD',
    member: { length: '2.4384 m', spacing: '1.2192 m', section: { shape: 'W12X26' } },
    loads: {
      selfWeight: false,
      area: [],
      line: [
        { case: 'D', value: kipPerFt(0.3) },
        { case: 'L', value: kipPerFt(0.4) },
      ],
      point: [],
    },
    connection: {
      arrangement: 'face-plate',
      plate: {
        N: '457.2 mm',
        B: '304.8 mm',
        thickness: '25.4 mm',
        Fy: `${(36 * 6.894757293168).toPrecision(15)} MPa`,
      },
      anchors: {
        perSide: 2,
        diameter: '25.4 mm',
        grade: 'F1554-36',
        offset: '190.5 mm',
        gauge: '228.6 mm',
        embedment: '304.8 mm',
      },
      concrete: { fc: `${(4 * 6.894757293168).toPrecision(15)} MPa`, cracked: true },
      pier: { length: '914.4 mm', width: '1219.2 mm' },
    },
  };
  const us = run(doc('LRFD'));
  const met = run(si);

  it('every check has the same ratio and the same verdict', () => {
    expect(met.checks.map((c) => c.id)).toEqual(us.checks.map((c) => c.id));
    us.checks.forEach((c, i) => {
      expect(met.checks[i].ok).toBe(c.ok);
      if (c.ratio === null) expect(met.checks[i].ratio).toBeNull();
      else expect(Math.abs(met.checks[i].ratio! - c.ratio)).toBeLessThan(1e-8 * Math.max(1, c.ratio));
    });
  });

  it('quantities convert: root moment in kN m, tip deflection in mm, plate demand in mm', () => {
    const mUS = us.member.combinations[1].rootMoment;
    const mSI = met.member.combinations[1].rootMoment;
    expect(mSI.unit).toBe('kN m');
    expect(rel(mSI.value, convert(mUS.value, 'kip ft', 'kN m'))).toBeLessThan(1e-8);
    expect(
      rel(met.member.cases.L!.tipDeflection.value, us.member.cases.L!.tipDeflection.value * 25.4),
    ).toBeLessThan(1e-8);
    expect(
      rel(check(met, 'plate.thickness').demand!.value, check(us, 'plate.thickness').demand!.value * 25.4),
    ).toBeLessThan(1e-8);
  });
});

describe('post-base plate, LRFD, end to end: DG1 large moment with compression, narrow-member breakout', () => {
  const r = run({
    ...memberDoc({
      loads: {
        selfWeight: false,
        area: [],
        line: [
          { case: 'D', value: '0.3 kip/ft' },
          { case: 'L', value: '0.4 kip/ft' },
        ],
        point: [],
      },
    }),
    connection: {
      arrangement: 'post-base',
      plate: { N: '20 in', B: '14 in', thickness: '1.25 in', Fy: '36 ksi' },
      anchors: {
        perSide: 2,
        diameter: '1 in',
        grade: 'F1554-36',
        offset: '8.5 in',
        gauge: '10 in',
        embedment: '12 in',
      },
      concrete: { fc: '4000 psi', cracked: true },
      pier: { length: '36 in', width: '36 in' },
    },
  });
  // 1.2D + 1.6L: Mu = 384 kip-in, Pu = Vu = 8.0 kip (Table 3-23 [mem]); e = 48 in.
  const Mu = 384;
  const Pu = 8;
  // J8: sqrt(A2/A1) = min(36/20, 36/14) = 1.8; fp,max = 0.65 x 0.85 x 4 x 1.8 = 3.978 ksi; qmax = 55.69 kip/in.
  const fpMax = 0.65 * 0.85 * 4 * 1.8;
  const qmax = fpMax * 14;
  const f = 8.5;
  const A = f + 10;
  // DG1 [mem]: e_crit = N/2 - P/(2 qmax) = 10 - 8/111.4 = 9.93 in < 48: large moment;
  // Y = A - sqrt(A^2 - 2(M + P f)/qmax) = 18.5 - sqrt(342.25 - 2 x 452/55.69) = 0.444 in; T = qmax Y - P = 16.7 kip.
  const Y = A - Math.sqrt(A * A - (2 * (Mu + Pu * f)) / qmax);
  const T = qmax * Y - Pu;

  it('bearing: Y, T and the moment ratio (M + P f)/(qmax (f + N/2)^2/2)', () => {
    expect(10 - Pu / (2 * qmax)).toBeLessThan(Mu / Pu);
    expect(rel(r.connection!.bearingLength.value, Y)).toBeLessThan(1e-9);
    expect(rel(r.connection!.anchorTensionPerRod.value, T / 2)).toBeLessThan(1e-9);
    expect(rel(check(r, 'plate.bearing').ratio!, (Mu + Pu * f) / ((qmax * A * A) / 2))).toBeLessThan(1e-9);
  });

  it('thickness: n partial bearing vs the tension side x = 8.5 - 6.1 + 0.19 = 2.59 in', () => {
    const m = (20 - 0.95 * d) / 2; // 4.205 in
    const n = (14 - 0.8 * bf) / 2; // 4.404 in
    const x = f - d / 2 + tf / 2;
    const req = Math.max(
      2.11 * Math.sqrt((fpMax * Y * (m - Y / 2)) / 36),
      2.11 * Math.sqrt((fpMax * Y * (n - Y / 2)) / 36),
      2.11 * Math.sqrt((T * x) / (14 * 36)),
    );
    expect(rel(check(r, 'plate.thickness').demand!.value, req)).toBeLessThan(1e-9);
  });

  it("breakout: beyond 9.5, sides 13 in < 1.5 hef = 18: hef' = max(13/1.5, 10/3) = 8.667 in (17.6.2.1.2 [mem])", () => {
    const h = 13 / 1.5;
    const reach = 1.5 * h; // 13 in
    const ANc = (9.5 + Math.min(26.5, reach)) * (10 + 13 + 13); // 22.5 x 36 = 810 in^2
    const ANco = 9 * h * h; // 676 in^2
    const psiEd = 0.7 + (0.3 * 9.5) / reach; // 0.919
    const Nb = (24 * rootFc * h ** 1.5) / 1000; // hef' < 11 in
    const b = check(r, 'anchors.concreteBreakout');
    expect(rel(b.capacity!.value, 0.7 * (ANc / ANco) * psiEd * Nb)).toBeLessThan(1e-9);
    expect(rel(b.demand!.value, T)).toBeLessThan(1e-9);
  });

  it('no horizontal force: friction carries nothing, the rods carry no shear, interaction = worst tension ratio', () => {
    const v = check(r, 'anchors.shear');
    expect(v.ratio).toBe(0);
    expect(v.reference).toMatch(/friction/);
    const n = Math.max(
      ...['anchors.steelTension', 'anchors.concreteBreakout', 'anchors.pullout'].map(
        (id) => check(r, id).ratio!,
      ),
    );
    expect(check(r, 'anchors.interaction').ratio).toBe(n);
  });
});
