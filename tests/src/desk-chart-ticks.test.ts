import { describe, expect, it } from 'vitest';
import { positionTicks, valueTicks } from '../../src/lib/chart-ticks';

const steps = (ticks: number[]) => ticks.slice(1).map((t, i) => Number((t - ticks[i]!).toPrecision(6)));

describe('desk chart ticks', () => {
  it('widens a value axis to whole steps of 1, 2 or 5 x 10^k that hold every value and zero', () => {
    expect(valueTicks([0, 12, 22.3, 5])).toEqual({ domain: [0, 25], ticks: [0, 5, 10, 15, 20, 25] });
    expect(valueTicks([-3, 4])).toEqual({ domain: [-4, 4], ticks: [-4, -2, 0, 2, 4] });
    const small = valueTicks([0.169, 0.9]);
    expect(small.domain).toEqual([0, 1]);
    expect(new Set(steps(small.ticks))).toEqual(new Set([0.2]));
  });

  it('ignores rounding noise around zero instead of adding a step below it', () => {
    expect(valueTicks([-1e-15, 4.86, 2]).domain).toEqual([0, 5]);
    expect(valueTicks([1e-16, -22.3]).domain).toEqual([-25, 0]);
  });

  it('falls back to 0..1 when every value is zero or not finite', () => {
    expect(valueTicks([0, 0, Number.NaN])).toEqual({ domain: [0, 1], ticks: [0, 1] });
  });

  it('spans the position axis exactly root to tip, with ticks at whole steps inside it', () => {
    expect(positionTicks(9)).toEqual({ domain: [0, 9], ticks: [0, 2, 4, 6, 8] });
    expect(positionTicks(2.7432)).toEqual({ domain: [0, 2.7432], ticks: [0, 0.5, 1, 1.5, 2, 2.5] });
    expect(positionTicks(10).ticks).toEqual([0, 2, 4, 6, 8, 10]);
    expect(positionTicks(Number.NaN)).toEqual({ domain: [0, 1], ticks: [0, 1] });
  });
});
