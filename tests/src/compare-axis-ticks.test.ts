/** Compare's axes: even d3-scale steps (1, 2 or 5 x 10^k; the d3-scale package is the oracle of "nice"). */
import { describe, expect, it } from 'vitest';
import { curveAxes, distanceAxis, unitText, valueAxis } from '../../src/features/compare/utils/axis-ticks';

const steps = (ticks: number[]) =>
  new Set(ticks.slice(1).map((t, i) => Number((t - ticks[i]).toPrecision(6))));

describe('compare axes', () => {
  it('gives even value steps that hold both curves, zero and the limit', () => {
    const axes = curveAxes(
      [
        [
          { x: 0, y: 14.2 },
          { x: 9, y: 0 },
        ],
        [
          { x: 0, y: 17.9 },
          { x: 10, y: 0 },
        ],
      ],
      [0.9],
    );
    expect(axes.y).toEqual({ domain: [0, 20], ticks: [0, 5, 10, 15, 20] });
    expect(axes.x.domain).toEqual([0, 10]);
    expect(steps(axes.x.ticks)).toEqual(new Set([2]));
    expect(steps(valueAxis([0, 0.17, 0.9]).ticks)).toEqual(new Set([0.2]));
  });

  it('falls back to 0..1 with nothing to draw, and writes units as the desk does', () => {
    expect(valueAxis([])).toEqual({ domain: [0, 1], ticks: [0, 1] });
    expect(distanceAxis(Number.NaN)).toEqual({ domain: [0, 1], ticks: [0, 1] });
    expect(unitText('kip ft')).toBe('kip·ft');
    expect(unitText('kN m')).toBe('kN·m');
  });
});
