/**
 * weld.flangeToWeb: the two fillet welds joining a flange to the web of a built-up or cut tapered I,
 * for the horizontal shear flow q = V Q / I (Q = bf tf (d - tf) / 2, the flange about the neutral
 * axis), checked at every station for every combination, largest near the root. Strength per inch
 * (AISC 360-16 J2.4, no directional increase): 2 x 0.60 FEXX x 0.707 w for the two welds, and the web
 * base metal in shear rupture 0.6 Fu tw (J4.2); phi 0.75 / Omega 2.00. Reported with the size the shear
 * flow needs, and checked with the minimum size of Table J2.4 for the web thickness [mem], E70 unless
 * the connection's weld names another electrode. Internal units kip, in, ksi.
 */
import type { Check } from '../types';
import { quantity } from '../units';
import type { CheckContext } from './check-context';
import { minimumFillet, FEXX } from '../connection/check-weld';

export function flangeWebWeldCheck(ctx: CheckContext, electrode: keyof typeof FEXX = 'E70'): Check | null {
  const { section, model, method, units } = ctx;
  if (section.kind === 'catalog' || (section.family !== 'I' && section.family !== 'W')) return null;
  let worst = { q: 0, node: 0, combo: 0 };
  for (let i = 0; i < model.grid.x.length; i++) {
    const p = model.props[i];
    const Q = p.bf * p.tf * ((p.d - p.tf) / 2);
    for (let c = 0; c < ctx.combos.length; c++) {
      const q = (Math.abs(ctx.combos[c].response.V[i]) * Q) / p.Ix;
      if (q > worst.q) worst = { q, node: i, combo: c };
    }
  }
  const p = model.props[worst.node];
  const factor = method === 'LRFD' ? 0.75 : 1 / 2.0;
  const perSize = factor * 2 * 0.6 * FEXX[electrode] * 0.707;
  const w = minimumFillet(p.tw);
  const Fu = 65; // A572 Gr 50 plates and A992 (REFERENCES.md [mem])
  const baseMetal = factor * 0.6 * Fu * p.tw;
  const capacity = Math.min(perSize * w, baseMetal);
  const ratio = worst.q / capacity;
  const needed = worst.q / perSize;
  const size = (v: number) =>
    `${Number((units === 'US' ? v : v * 25.4).toFixed(units === 'US' ? 3 : 1))} ${units === 'US' ? 'in' : 'mm'}`;
  return {
    id: 'weld.flangeToWeb',
    title: 'Flange-to-web welds (shear flow)',
    reference: 'AISC 360-16 J2.4, Table J2.4; J4.2',
    combination: ctx.combos[worst.combo]?.name ?? null,
    demand: quantity(worst.q, 'forcePerLength', units),
    capacity: quantity(capacity, 'forcePerLength', units),
    ratio,
    ok: ratio <= 1,
    at: quantity(model.grid.x[worst.node], 'length', units),
    note: `q = V Q / I; two ${electrode} fillets need ${size(needed)} each for strength; Table J2.4 minimum ${size(w)} for the ${size(p.tw)} web (capacity shown at that size${baseMetal < perSize * w ? ', limited by the web base metal' : ''})`,
  };
}
