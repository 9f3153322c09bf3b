/**
 * anchors.interaction: tension and shear on the rods together, ACI 318-19 17.8. When the shear ratio
 * is at most 0.2 the full tension strength is allowed (and vice versa); otherwise
 * N/phiNn + V/phiVn <= 1.2. The reported ratio is scaled so that 1.0 is the limit.
 */
import type { CheckSpec, Evaluation } from './check-row';
import { notComputed } from './check-row';

export const INTERACTION: CheckSpec = {
  id: 'anchors.interaction',
  title: 'Rods in tension and shear together',
  reference: 'ACI 318-19 17.8',
};

/** Combines the worst tension ratio and the rods' shear ratio of one combination. */
export function evaluateInteraction(tensionRatios: (number | null)[], shearRatio: number | null): Evaluation {
  if (shearRatio === null || tensionRatios.some((r) => r === null)) {
    return notComputed(
      'force',
      'A tension or shear check of the rods could not be computed, so neither can their interaction.',
    );
  }
  const n = Math.max(0, ...(tensionRatios as number[]));
  const v = shearRatio;
  if (n <= 0.2 || v <= 0.2) {
    const note = `Tension ratio ${n.toFixed(2)} and shear ratio ${v.toFixed(2)}: one is at most 0.2, so the larger alone against 1.0.`;
    return { demand: null, capacity: null, kind: 'force', ratio: Math.max(n, v), note };
  }
  return {
    demand: null,
    capacity: null,
    kind: 'force',
    ratio: (n + v) / 1.2,
    note: `Tension ratio ${n.toFixed(2)} + shear ratio ${v.toFixed(2)} against 1.2.`,
  };
}
