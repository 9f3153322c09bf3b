/**
 * The elevation's cursor and marks: values at x from the engine's stations, the keyboard's steps,
 * the deflection limit's marker at the tip, the service series of the deflection checks and the
 * support drawn behind the root. Oracles: the engine's own station arrays and checks (a station's
 * reading must be the engine's value there; between stations, linear interpolation), and the demo
 * document's own inputs.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign, exampleMemberOnly } from '../../shared/engine/examples';
import type { StationSeries } from '../../shared/engine/types';
import { limitSeriesKey, seriesChoices, seriesFromCases } from '../../src/features/desk/lib/chart-data';
import { LIMIT_REACH, limitMarker, stepCursor, valuesAt } from '../../src/features/desk/lib/elevation-cursor';
import { elevationShape } from '../../src/features/desk/lib/elevation-geometry';
import { readoutParts } from '../../src/features/desk/components/elevation/elevation-stack';
import { parsedDesignSchema } from '../../shared/schemas/parsed-design';

const result = evaluateDesign(parsedDesignSchema.parse(exampleDesign), { stations: true });
const s = result.stations!;

describe('values at the cursor', () => {
  const series: StationSeries = { name: 'test', V: [10, 6, 0], M: [20, 5, 0], deflection: [0, 0.1, 0.4] };
  const x = [0, 2, 6];
  const depth = [12, 10, 6];

  it('reads the station values exactly on a station and interpolates linearly between them', () => {
    expect(valuesAt(x, depth, series, 2)).toEqual({ x: 2, V: 6, M: 5, deflection: 0.1, depth: 10 });
    const mid = valuesAt(x, depth, series, 3);
    // a quarter of the way from x = 2 to x = 6
    expect(mid.V).toBeCloseTo(4.5, 12);
    expect(mid.M).toBeCloseTo(3.75, 12);
    expect(mid.deflection).toBeCloseTo(0.175, 12);
    expect(mid.depth).toBeCloseTo(9, 12);
  });

  it('clamps a cursor behind the root or past the tip to the member', () => {
    expect(valuesAt(x, depth, series, -1)).toEqual({ x: 0, V: 10, M: 20, deflection: 0, depth: 12 });
    expect(valuesAt(x, depth, series, 9).x).toBe(6);
    expect(valuesAt(x, depth, series, 9).deflection).toBe(0.4);
  });

  it("gives the engine's root demand and tip deflection at the ends of a real result", () => {
    const combo = s.combinations.find((c) => c.name === result.member.combinations[1].name)!;
    const root = valuesAt(s.x, s.depth, combo, 0);
    expect(root.M).toBeCloseTo(result.member.combinations[1].rootMoment.value, 9);
    expect(root.V).toBeCloseTo(result.member.combinations[1].rootShear.value, 9);
    const tip = valuesAt(s.x, s.depth, combo, s.x.at(-1)!);
    expect(tip.deflection).toBe(combo.deflection.at(-1));
    // W8X18, d = 8.14 in (the open shapes dataset)
    expect(tip.depth).toBeCloseTo(8.14, 6);
  });

  it('writes the reading with the desk units (kip·ft) and the sense of the deflection', () => {
    const parts = readoutParts({ x: 2.25, V: 1.5, M: -3, deflection: -0.05, depth: 8.14 }, s.units);
    expect(parts).toEqual({
      x: '2.25 ft from the root',
      V: '1.5 kip',
      M: '-3 kip·ft',
      deflection: '0.05 in up',
      depth: '8.14 in',
    });
  });
});

describe('keyboard steps', () => {
  const x = [0, 1, 2, 3, 4, 5, 6, 7];
  it('moves station to station, five for Page Up / Page Down, to the ends for Home / End', () => {
    expect(stepCursor(x, 2, 'ArrowRight')).toBe(3);
    expect(stepCursor(x, 2, 'ArrowUp')).toBe(3);
    expect(stepCursor(x, 2, 'ArrowLeft')).toBe(1);
    expect(stepCursor(x, 1, 'PageUp')).toBe(6);
    expect(stepCursor(x, 4, 'PageDown')).toBe(0);
    expect(stepCursor(x, 3, 'Home')).toBe(0);
    expect(stepCursor(x, 3, 'End')).toBe(7);
    expect(stepCursor(x, 7, 'ArrowRight')).toBe(7);
    expect(stepCursor(x, 0, 'ArrowLeft')).toBe(0);
  });

  it('lands on the neighbouring station from a point between stations, and starts at an end', () => {
    expect(stepCursor(x, 2.4, 'ArrowRight')).toBe(3);
    expect(stepCursor(x, 2.4, 'ArrowLeft')).toBe(2);
    expect(stepCursor(x, null, 'ArrowRight')).toBe(0);
    expect(stepCursor(x, null, 'ArrowLeft')).toBe(7);
  });
});

describe('the deflection limit at the tip', () => {
  it('is on the scale when it is within LIMIT_REACH times the largest deflection', () => {
    const m = limitMarker([0, 0.1, 0.4], 0.9);
    expect(m).toEqual({ y: 0.9, offScale: false, axisValues: [0, 0.1, 0.4, 0.9] });
  });

  it('sits at the edge, marked off the scale, when it would squash the curve', () => {
    const m = limitMarker([0, 0.02, 0.05], 0.9);
    expect(m.offScale).toBe(true);
    expect(m.y).toBeCloseTo(LIMIT_REACH * 0.05, 12);
    expect(Math.max(...m.axisValues)).toBeCloseTo(LIMIT_REACH * 0.05, 12);
  });

  it('goes on the side the tip moves: upward for a tip that lifts', () => {
    expect(limitMarker([0, -0.2, -0.4], 0.9).y).toBe(-0.9);
  });
});

describe('series with a deflection limit', () => {
  it("builds the total-load check's service combination from the cases, ending at the check's demand", () => {
    const total = result.checks.find((c) => c.id === 'member.deflection.total')!;
    const choices = seriesChoices(result);
    const key = limitSeriesKey(choices);
    const choice = choices.find((c) => c.key === key)!;
    expect(choice.series.name).toBe(total.combination);
    expect(choice.kind).toBe('service');
    expect(choice.limit).toEqual({ value: total.capacity!.value, unit: 'in', which: 'total-load' });
    // the engine's demand for the check is the tip deflection of that combination
    expect(choice.series.deflection.at(-1)).toBeCloseTo(total.demand!.value, 9);
  });

  it('reads factors from the names and skips what does not read', () => {
    const sum = seriesFromCases(s, '2D + 0.5L')!;
    const D = s.cases.find((c) => c.name === 'D')!;
    const L = s.cases.find((c) => c.name === 'L')!;
    expect(sum.M[0]).toBeCloseTo(2 * D.M[0] + 0.5 * L.M[0], 9);
    expect(seriesFromCases(s, '0.2D upward (ASCE 7-16 12.4.4)')).toBeUndefined();
  });
});

describe('the support in elevation', () => {
  it("centres the plate and pier under the post, rods at the layout's rows, the tension row behind the root", () => {
    const shape = elevationShape(result, exampleDesign)!;
    expect(shape.arrangement).toBe('post-base');
    // W8X18 as its own footprint: d = 8.14 in (the open shapes dataset)
    expect(shape.post!.x0).toBeCloseTo(-8.14, 6);
    const centre = -8.14 / 2;
    // plate N = 18 in, pier length 30 in (the demo document)
    expect(shape.plate!.x1 - shape.plate!.x0).toBeCloseTo(18, 9);
    expect((shape.plate!.x0 + shape.plate!.x1) / 2).toBeCloseTo(centre, 9);
    expect((shape.pier!.x0 + shape.pier!.x1) / 2).toBeCloseTo(centre, 9);
    const tension = shape.rods.find((r) => r.row === 'tension')!;
    const compression = shape.rods.find((r) => r.row === 'compression')!;
    // rods 7 in each side of the plate centre (anchors.offset), down the 12 in embedment
    expect(tension.x0).toBeCloseTo(centre - 7, 9);
    expect(compression.x0).toBeCloseTo(centre + 7, 9);
    expect(tension.y1 - shape.plate!.y1).toBeCloseTo(12, 9);
    expect(shape.behind).toBeCloseTo(30 / 2 + 8.14 / 2, 9);
    expect(shape.notes[0]).toMatch(/No post height given/);
  });

  it('draws a plain fixed root for a member without a connection', () => {
    const alone = evaluateDesign(parsedDesignSchema.parse(exampleMemberOnly), { stations: true });
    const shape = elevationShape(alone, exampleMemberOnly)!;
    expect(shape.arrangement).toBe('none');
    expect(shape.plate).toBeNull();
    expect(shape.length).toBeCloseTo(108, 9);
  });
});
