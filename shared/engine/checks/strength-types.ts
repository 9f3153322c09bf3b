/** What a strength function of AISC 360-16 returns: the nominal strength and the governing clause. */
export interface Strength {
  /** Nominal strength: Mn in kip·in or Vn in kip. */
  nominal: number;
  /** Clause of the governing limit state, e.g. "F2.2". */
  clause: string;
  /** The limit state in plain words, e.g. "lateral-torsional buckling". */
  limitState: string;
  /** Set when the section is outside the clause's limits: the check then fails with this note. */
  outOfScope?: string;
}

/** Design strength: phi Rn (LRFD) or Rn / Omega (ASD). */
export function available(nominal: number, method: 'LRFD' | 'ASD', phi: number, omega: number): number {
  return method === 'LRFD' ? phi * nominal : nominal / omega;
}

/** Picks the smallest of several limit states (the governing one). */
export function governing(list: readonly Strength[]): Strength {
  let best = list[0];
  for (const s of list) if (s.nominal < best.nominal) best = s;
  return best;
}
