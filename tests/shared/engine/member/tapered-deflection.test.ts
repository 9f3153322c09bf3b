import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../../shared/engine/member/analysis';
import type { CaseLoads } from '../../../../shared/engine/member/case-loads';
import { iSectionProps } from '../../../../shared/engine/sections/i-section';
import type { MemberSection, SectionProps } from '../../../../shared/engine/sections/section-types';
import { memberDoc, rel, run } from '../design-helpers';

const E = 29000;
const L = 120;

/** A section whose Ix follows a given law along t = x / L (only Ix matters to the deflection). */
function sectionWithIx(Ix: (t: number) => number): MemberSection {
  const base = iSectionProps(12, 6, 0.5, 0.25);
  const at = (t: number): SectionProps => ({ ...base, Ix: Ix(t) });
  return {
    label: 'test',
    kind: 'built-up',
    family: 'I',
    prismatic: false,
    rolled: false,
    root: at(0),
    tip: at(1),
    at,
    IxAt: Ix,
    defaultFy: 50,
    defaultGrade: 'test',
  };
}

const tipLoad = (P: number): CaseLoads => ({ case: 'L', q0: 0, q1: 0, points: [{ P, a: L }] });
const tipDeflection = (s: MemberSection, c: CaseLoads, n?: number) => {
  const m = analyseMember(s, L, E, [c], n);
  const y = m.cases[0].response.y;
  return y[y.length - 1];
};

describe('tapered cantilevers against published closed forms', () => {
  it('Megson (Structural and Stress Analysis, ch. 13 [pub, attribution mem]): I from I0 at the tip to 2 I0 at the root, tip load W: (ln 2 - 1/2) W L^3 / (E I0)', () => {
    const I0 = 100;
    const W = 2;
    const s = sectionWithIx((t) => I0 * (2 - t));
    const expected = ((Math.log(2) - 0.5) * W * L ** 3) / (E * I0);
    expect(rel(tipDeflection(s, tipLoad(W)), expected)).toBeLessThan(1e-5);
  });

  it.each([0.2, 1, 3, 9])(
    'general n = 1 law I = I_tip (1 + a u), u from the tip (REFERENCES.md [calc]), a = %s',
    (a) => {
      const Itip = 50;
      const P = 1.5;
      const s = sectionWithIx((t) => Itip * (1 + a * (1 - t)));
      const bracket = (1 + a) ** 2 / 2 - 2 * (1 + a) + 1.5 + Math.log(1 + a);
      const expected = ((P * L ** 3) / (E * Itip)) * (bracket / a ** 3);
      expect(rel(tipDeflection(s, tipLoad(P)), expected)).toBeLessThan(1e-4);
    },
  );

  it('converges: the default 40 intervals agree with 400 intervals to far better than 0.1 %', () => {
    const s = sectionWithIx((t) => 200 * (1 - 0.8 * t) ** 3);
    const c: CaseLoads = { case: 'D', q0: 0.02, q1: -0.00005, points: [{ P: 0.5, a: 77.7 }] };
    expect(rel(tipDeflection(s, c), tipDeflection(s, c, 400))).toBeLessThan(1e-4);
  });
});

// ---- an independent oracle, written here and sharing no code with the engine --------------------

/** Adaptive Simpson quadrature (common practice, no source). */
function adaptiveSimpson(f: (x: number) => number, a: number, b: number, tol = 1e-12): number {
  const simpson = (lo: number, hi: number, flo: number, fm: number, fhi: number) =>
    ((hi - lo) / 6) * (flo + 4 * fm + fhi);
  const recurse = (
    lo: number,
    hi: number,
    flo: number,
    fm: number,
    fhi: number,
    whole: number,
    eps: number,
    depth: number,
  ): number => {
    const m = (lo + hi) / 2;
    const lm = (lo + m) / 2;
    const rm = (m + hi) / 2;
    const flm = f(lm);
    const frm = f(rm);
    const left = simpson(lo, m, flo, flm, fm);
    const right = simpson(m, hi, fm, frm, fhi);
    if (depth > 40 || Math.abs(left + right - whole) <= 15 * eps)
      return left + right + (left + right - whole) / 15;
    return (
      recurse(lo, m, flo, flm, fm, left, eps / 2, depth + 1) +
      recurse(m, hi, fm, frm, fhi, right, eps / 2, depth + 1)
    );
  };
  const fa = f(a);
  const fb = f(b);
  const fm = f((a + b) / 2);
  return recurse(a, b, fa, fm, fb, simpson(a, b, fa, fm, fb), tol, 0);
}

describe('a built-up tapered I against virtual work with adaptive Simpson (independent code)', () => {
  it('tip deflection under uniform load, self-weight and a point load', () => {
    // Plates: root 16 in, tip 8 in, flanges 6 x 1/2 in, web 1/4 in; length 10 ft; E 29000 ksi.
    const Lm = 120;
    const depth = (x: number) => 16 - (8 * x) / Lm;
    const Ix = (x: number) => {
      const d = depth(x);
      return (6 * d ** 3 - 5.75 * (d - 1) ** 3) / 12;
    };
    const area = (x: number) => 2 * 6 * 0.5 + (depth(x) - 1) * 0.25;
    const gamma = 0.49 / 1728; // kip/in^3, 490 lb/ft^3
    const w = 0.4 / 12; // 400 lbf/ft line load, kip/in
    const P = 0.3; // kip at 8 ft
    const a = 96;
    // M(x) of the loads beyond x (statics, written out again here).
    const M = (x: number) => {
      const uniform = (w * (Lm - x) ** 2) / 2;
      const self = adaptiveSimpson((s) => gamma * area(s) * (s - x), x, Lm, 1e-14);
      return uniform + self + (x < a ? P * (a - x) : 0);
    };
    // Unit load at the tip: m(x) = L - x; deflection = integral of M m / (E I).
    const oracle =
      adaptiveSimpson((x) => (M(x) * (Lm - x)) / (E * Ix(x)), 0, a, 1e-12) +
      adaptiveSimpson((x) => (M(x) * (Lm - x)) / (E * Ix(x)), a, Lm, 1e-12);

    const r = run(
      memberDoc({
        length: '10 ft',
        section: {
          plates: {
            rootDepth: '16 in',
            tipDepth: '8 in',
            flangeWidth: '6 in',
            flangeThickness: '0.5 in',
            webThickness: '0.25 in',
          },
        },
        loads: {
          selfWeight: true,
          area: [],
          line: [{ case: 'D', value: '400 lbf/ft' }],
          point: [{ case: 'D', value: '300 lbf', at: '8 ft' }],
        },
      }),
    );
    expect(rel(r.member.cases.D!.tipDeflection.value, oracle)).toBeLessThan(1e-4);
    expect(r.member.section.kind).toBe('built-up');
  });
});
