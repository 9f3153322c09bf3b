import { describe, expect, it } from 'vitest';
import { niceStep, positionTicks, valueTicks } from '../../src/features/desk/lib/chart-ticks';

describe('desk chart ticks', () => {
  it('picks steps of 1, 2, 2.5 or 5 times a power of ten', () => {
    expect(niceStep(22.3, 4)).toBe(10);
    expect(niceStep(4.86, 4)).toBe(2);
    expect(niceStep(0.9, 4)).toBe(0.25);
    expect(niceStep(9, 5)).toBe(2);
  });

  it('widens a value axis to whole steps that hold every value and zero', () => {
    expect(valueTicks([0, 12, 22.3, 5])).toEqual({ domain: [0, 30], ticks: [0, 10, 20, 30] });
    expect(valueTicks([-3, 4])).toEqual({ domain: [-4, 4], ticks: [-4, -2, 0, 2, 4] });
    expect(valueTicks([0.169, 0.9]).ticks).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('ignores rounding noise around zero instead of adding a step below it', () => {
    expect(valueTicks([-1e-15, 4.86, 2]).domain).toEqual([0, 6]);
    expect(valueTicks([1e-16, -22.3]).domain).toEqual([-30, 0]);
  });

  it('falls back to 0..1 when every value is zero or not finite', () => {
    expect(valueTicks([0, 0, Number.NaN])).toEqual({ domain: [0, 1], ticks: [0, 1] });
  });

  it('spans the position axis exactly root to tip, with ticks at whole steps inside it', () => {
    expect(positionTicks(9)).toEqual({ domain: [0, 9], ticks: [0, 2, 4, 6, 8] });
    expect(positionTicks(2.7432)).toEqual({ domain: [0, 2.7432], ticks: [0, 1, 2] });
    expect(positionTicks(10).ticks).toEqual([0, 2, 4, 6, 8, 10]);
  });
});
