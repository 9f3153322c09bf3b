import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign, exampleMemberOnly } from '../../shared/engine/examples';
import {
  chartRows,
  defaultSeriesKey,
  deflectionLimit,
  describeSeries,
  seriesChoices,
} from '../../src/features/desk/lib/chart-data';
import { platePlan } from '../../src/features/desk/lib/plate-plan';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

const result = evaluateDesign(parsedDesignSchema.parse(exampleDesign), { stations: true });

describe('chart data from the stations', () => {
  it('offers every combination and every case, governing bending combination first', () => {
    const choices = seriesChoices(result);
    expect(
      choices
        .filter((c) => c.kind === 'case')
        .map((c) => c.series.name)
        .sort(),
    ).toEqual(['D', 'L', 'S']);
    const flexure = result.checks.find((c) => c.id === 'member.flexure');
    expect(defaultSeriesKey(result)).toBe(`combination:${flexure?.combination}`);
  });

  it('puts the deflection limit at span/ratio with span = 2 x length, in the chart unit', () => {
    const limit = deflectionLimit(result, 240);
    expect(limit?.unit).toBe('in');
    expect(limit?.value).toBeCloseTo((2 * 9 * 12) / 240, 6);
    const rows = chartRows(result.stations!.x, result.stations!.combinations[0]);
    expect(rows).toHaveLength(result.stations!.x.length);
    expect(rows[0].d).toBe(0);
  });

  it('summarises each diagram in words with units for screen readers', () => {
    const series = result.stations!.cases.find((c) => c.name === 'L')!;
    const words = describeSeries(result, series, deflectionLimit(result, 360));
    expect(words.moment).toMatch(/^Moment for L: largest [\d.]+ kip·ft at 0 ft from the root/);
    expect(words.deflection).toMatch(/[\d.]+ in downward at the tip, against a limit of 0\.6 in\.$/);
  });
});

describe('plate plan for the sketch', () => {
  it('lays out the plate, rods and bearing zone from the engine geometry', () => {
    const plan = platePlan(exampleDesign, result);
    expect(plan).not.toBeNull();
    const { layout, bearing } = plan!;
    expect(layout.plate.N).toBe(18);
    expect(layout.rods).toHaveLength(4);
    expect(layout.holeDiameter).toBeCloseTo(1 + 5 / 16, 6);
    expect(layout.edgeDistances.rodToPlateAlongN).toBeCloseTo(18 / 2 - 7, 6);
    expect(bearing!.x0).toBe(-9);
    expect(bearing!.x1).toBeGreaterThan(-9);
  });

  it('draws nothing for a member without a connection or with a size that does not parse', () => {
    expect(platePlan(exampleMemberOnly, null)).toBeNull();
    const broken = {
      ...exampleDesign,
      connection: { ...exampleDesign.connection!, plate: { ...exampleDesign.connection!.plate, N: 'wide' } },
    };
    expect(platePlan(broken, null)).toBeNull();
  });
});
