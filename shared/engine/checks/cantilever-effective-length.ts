/**
 * Effective-length factors for the lateral-torsional buckling of a cantilever without intermediate
 * lateral restraint, by the restraint at the root, the restraint at the tip and where the load acts.
 *
 * Source: IS 800:2007 Table 16 "Effective length for cantilever of length L", which repeats
 * BS 5950-1:2000 Table 14 (values from the published tables as quoted in a public exam-preparation
 * page; checked against memory of BS 5950-1 Table 14, which agrees for the rows used here).
 * Rows used (root): (c) "continuous, with lateral and torsional restraint" and (d) "restrained
 * laterally, torsionally and against rotation on plan". Columns used (tip): (i) free and
 * (iii) torsional restraint. "normal" load: at or below the shear centre; "destabilising": load on
 * the top flange free to move with it (gravity load on a top flange that nothing holds).
 */
export type RootRestraint = 'fixed' | 'twist-only';
export type TipRestraint = 'free' | 'braced';
export type LoadHeight = 'normal' | 'destabilising';

/** [normal, destabilising] factors on the cantilever's length. */
export const CANTILEVER_K: Readonly<Record<RootRestraint, Record<TipRestraint, readonly [number, number]>>> =
  {
    // (d) restrained laterally, torsionally and against rotation on plan (built in, warping held).
    fixed: { free: [0.8, 1.4], braced: [0.6, 0.6] },
    // (c) continuous, with lateral and torsional restraint (twist stopped, warping and plan rotation free).
    'twist-only': { free: [1.0, 2.5], braced: [0.8, 1.5] },
  };

/** The table's factor K (effective length = K x length). */
export function cantileverK(root: RootRestraint, tip: TipRestraint, load: LoadHeight): number {
  return CANTILEVER_K[root][tip][load === 'normal' ? 0 : 1];
}

export const CANTILEVER_K_SOURCE = 'IS 800:2007 Table 16 / BS 5950-1:2000 Table 14';
