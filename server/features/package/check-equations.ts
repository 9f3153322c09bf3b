/**
 * The equation each check evaluates, in symbols and words, as the engine's method documents state
 * it (shared/engine/METHOD.md, shared/engine/connection/METHOD.md). The numbers come from the
 * stored check itself; nothing here is computed again.
 */
import type { Check, Method } from '../../../shared/engine/types';
import { formatQuantity } from '../../../shared/engine/units';

const EQUATIONS: Record<string, { LRFD: string; ASD: string }> = {
  'member.flexure': {
    LRFD: 'Mu <= φb Mn, φb = 0.90; Mn the governing flexural limit state of the clause (yielding, lateral-torsional or local buckling) over the governing unbraced segment (see the note)',
    ASD: 'Ma <= Mn / Ωb, Ωb = 1.67; Mn the governing flexural limit state of the clause (yielding, lateral-torsional or local buckling) over the governing unbraced segment (see the note)',
  },
  'member.flexure.uplift': {
    LRFD: 'Mu <= φb Mn with the top flange in compression (net upward load), φb = 0.90',
    ASD: 'Ma <= Mn / Ωb with the top flange in compression (net upward load), Ωb = 1.67',
  },
  'member.shear': {
    LRFD: 'Vu <= φv Vn, Vn = 0.6 Fy Aw Cv (AISC 360-16 G2, G4 or G5 by section)',
    ASD: 'Va <= Vn / Ωv, Vn = 0.6 Fy Aw Cv (AISC 360-16 G2, G4 or G5 by section)',
  },
  'member.deflection.live': {
    LRFD: 'Δlive <= 2L / limit (span of a cantilever = twice its length), service combinations without D',
    ASD: 'Δlive <= 2L / limit (span of a cantilever = twice its length), service combinations without D',
  },
  'member.deflection.total': {
    LRFD: 'Δtotal <= 2L / limit (span of a cantilever = twice its length), ASCE 7-16 2.4.1 service combinations',
    ASD: 'Δtotal <= 2L / limit (span of a cantilever = twice its length), ASCE 7-16 2.4.1 service combinations',
  },
  'member.vibration': {
    LRFD: 'ratio = frequencyMin / f1, f1 the first bending frequency (steel and dead load, no live load)',
    ASD: 'ratio = frequencyMin / f1, f1 the first bending frequency (steel and dead load, no live load)',
  },
  'plate.bearing': {
    LRFD: "fp <= fp,max = φc 0.85 f'c sqrt(A2/A1), φc = 0.65, 1 <= sqrt(A2/A1) <= 2; large moment: (M + P f) against qmax (f + N/2)² / 2",
    ASD: "fp <= fp,max = 0.85 f'c sqrt(A2/A1) / Ωc, Ωc = 2.31, 1 <= sqrt(A2/A1) <= 2; large moment: (M + P f) against qmax (f + N/2)² / 2",
  },
  'plate.thickness': {
    LRFD: 'tp,req = max(1.5 l sqrt(fp / Fy) or 2.11 sqrt(fp Y (l - Y/2) / Fy) on the bearing side, 2.11 sqrt(T x / (B Fy)) on the tension side); ratio = tp,req / tp',
    ASD: 'tp,req = max(1.83 l sqrt(fp / Fy) or 2.58 sqrt(fp Y (l - Y/2) / Fy) on the bearing side, 2.58 sqrt(T x / (B Fy)) on the tension side); ratio = tp,req / tp',
  },
  'plate.geometry': {
    LRFD: 'the plate fits the pier and the section fits the plate (plan dimensions)',
    ASD: 'the plate fits the pier and the section fits the plate (plan dimensions)',
  },
  'anchors.layout': {
    LRFD: 'hole, spacing and edge distances against the tabulated minimums for the rod size',
    ASD: 'hole, spacing and edge distances against the tabulated minimums for the rod size',
  },
  'anchors.steelTension': {
    LRFD: 'Tu per rod <= φ Nsa, the lesser of 0.75 Fu Ab (AISC J3.6) and Ase futa (ACI 17.6.1), φ = 0.75',
    ASD: 'Ta per rod <= the lesser of 0.75 Fu Ab / 2.00 (AISC J3.6) and 0.75 Ase futa / 1.6 (ACI 17.6.1)',
  },
  'anchors.concreteBreakout': {
    LRFD: "Nu,row <= φ Ncbg = φ (ANc / ANco) ψed,N ψc,N ψcp,N Nb, Nb = 24 λa sqrt(f'c) hef^1.5",
    ASD: "Na,row <= φ Ncbg / 1.6, Ncbg = (ANc / ANco) ψed,N ψc,N ψcp,N Nb, Nb = 24 λa sqrt(f'c) hef^1.5",
  },
  'anchors.pullout': {
    LRFD: "Nu per rod <= φ ψc,P Np, Np = 8 Abrg f'c, φ = 0.70",
    ASD: "Na per rod <= 0.70 ψc,P Np / 1.6, Np = 8 Abrg f'c",
  },
  'anchors.sideFaceBlowout': {
    LRFD: "Nu <= φ Nsb, Nsb = 160 ca1 sqrt(Abrg) λa sqrt(f'c) (with the corner and group factors of the clause)",
    ASD: "Na <= φ Nsb / 1.6, Nsb = 160 ca1 sqrt(Abrg) λa sqrt(f'c) (with the corner and group factors of the clause)",
  },
  'anchors.shear': {
    LRFD: 'H <= φ μ P by friction (μ = 0.55, φ = 0.75), otherwise the least of rod steel 0.6 Ase futa, concrete breakout and pryout',
    ASD: 'H <= μ P / 2.00 by friction (μ = 0.55), otherwise the least of rod steel, concrete breakout and pryout, divided by 1.6',
  },
  'anchors.interaction': {
    LRFD: 'N = Nua / φNn and V = Vua / φVn of one combination: if either <= 0.2 the other alone, else (N + V) / 1.2',
    ASD: 'N = Na / (φNn / 1.6) and V = Va / (φVn / 1.6) of one combination: if either <= 0.2 the other alone, else (N + V) / 1.2',
  },
  'post.combined': {
    LRFD: 'AISC 360-16 H1-1a (Pr/Pc >= 0.2): Pr/Pc + (8/9) Mr/Mc <= 1.0, else H1-1b: Pr/(2Pc) + Mr/Mc <= 1.0; Pc from E3 with Lc = 2.1 h, Mc from Chapter F with Lb = h, Cb = 1.0',
    ASD: 'AISC 360-16 H1-1a (Pr/Pc >= 0.2): Pr/Pc + (8/9) Mr/Mc <= 1.0, else H1-1b: Pr/(2Pc) + Mr/Mc <= 1.0; Pc from E3 with Lc = 2.1 h, Mc from Chapter F with Lb = h, Cb = 1.0',
  },
  'weld.strength': {
    LRFD: 'fr = vector sum of M / Sw, P / Lw and V / L_parallel per inch <= φ 0.60 FEXX 0.707 w, φ = 0.75, and not above the base metal 0.6 Fu t (J4.2)',
    ASD: 'fr = vector sum of M / Sw, P / Lw and V / L_parallel per inch <= 0.60 FEXX 0.707 w / Ω, Ω = 2.00, and not above the base metal 0.6 Fu t (J4.2)',
  },
  'weld.flangeToWeb': {
    LRFD: 'shear flow q = V Q / I at every station <= two fillets of the Table J2.4 minimum size (AISC 360-16 J2.4), and the web base metal (J4.2)',
    ASD: 'shear flow q = V Q / I at every station <= two fillets of the Table J2.4 minimum size (AISC 360-16 J2.4), and the web base metal (J4.2)',
  },
  'connection.demand': {
    LRFD: 'the forces the member delivers to the pier under the governing combination',
    ASD: 'the forces the member delivers to the pier under the governing combination',
  },
};

export function checkEquation(check: Check, method: Method): string {
  const known = EQUATIONS[check.id];
  if (known) return known[method];
  return 'ratio = demand / capacity under the clause named above';
}

/** The numbers put into the ratio, as the check stores them. */
export function checkNumbers(check: Check): string {
  if (check.ratio === null || !Number.isFinite(check.ratio))
    return 'not computed: the engine could not evaluate this check (see the note)';
  const d = check.demand ? formatQuantity(check.demand, 4) : null;
  const c = check.capacity ? formatQuantity(check.capacity, 4) : null;
  if (d && c) return `ratio = demand / capacity = ${d} / ${c} = ${check.ratio.toFixed(2)}`;
  return `ratio = ${check.ratio.toFixed(2)}`;
}
