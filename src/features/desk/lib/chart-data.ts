/** Chart rows and plain-words summaries from the station arrays of a result. */
import type { DesignResult, StationSeries } from '../../../../shared/engine/types';
import { convert, formatQuantity, type Quantity } from '../../../../shared/engine/units';

export interface SeriesChoice {
  key: string;
  label: string;
  kind: 'case' | 'combination';
  series: StationSeries;
}

export function seriesChoices(result: DesignResult): SeriesChoice[] {
  const s = result.stations;
  if (!s) return [];
  return [
    ...s.combinations.map((series) => ({
      key: `combination:${series.name}`,
      label: series.name,
      kind: 'combination' as const,
      series,
    })),
    ...s.cases.map((series) => ({
      key: `case:${series.name}`,
      label: `${series.name} alone (unfactored)`,
      kind: 'case' as const,
      series,
    })),
  ];
}

/** The default series: the combination that governs bending, else the first. */
export function defaultSeriesKey(result: DesignResult): string {
  const flexure = result.checks.find((c) => c.id === 'member.flexure');
  const choices = seriesChoices(result);
  const governing = choices.find((c) => c.kind === 'combination' && c.label === flexure?.combination);
  return (governing ?? choices[0])?.key ?? '';
}

export interface ChartRow {
  x: number;
  M: number;
  V: number;
  d: number;
  /** The deflection limit, the same at every station (drawn as a dashed line). */
  limit?: number;
}

export function chartRows(
  x: readonly number[],
  series: StationSeries,
  limit: number | null = null,
): ChartRow[] {
  return x.map((xi, i) => ({
    x: xi,
    M: series.M[i],
    V: series.V[i],
    d: series.deflection[i],
    ...(limit !== null ? { limit } : {}),
  }));
}

/** The deflection limit (span = 2 × length) in the chart's deflection unit. */
export function deflectionLimit(result: DesignResult, ratio: number): Quantity | null {
  const s = result.stations;
  if (!s || s.x.length === 0 || !(ratio > 0)) return null;
  const length = s.x[s.x.length - 1];
  return { value: (2 * convert(length, s.units.x, s.units.deflection)) / ratio, unit: s.units.deflection };
}

function peak(values: readonly number[], x: readonly number[]): { value: number; at: number } {
  let best = 0;
  for (let i = 1; i < values.length; i += 1) if (Math.abs(values[i]) > Math.abs(values[best])) best = i;
  return { value: values[best] ?? 0, at: x[best] ?? 0 };
}

export function describeSeries(result: DesignResult, series: StationSeries, limit: Quantity | null) {
  const s = result.stations;
  if (!s) return { moment: '', shear: '', deflection: '' };
  const u = s.units;
  const q = (value: number, unit: string) => formatQuantity({ value, unit });
  const m = peak(series.M, s.x);
  const v = peak(series.V, s.x);
  const tip = series.deflection[series.deflection.length - 1] ?? 0;
  return {
    moment: `Moment for ${series.name}: largest ${q(m.value, u.M)} at ${q(m.at, u.x)} from the root, falling to ${q(series.M[series.M.length - 1] ?? 0, u.M)} at the tip.`,
    shear: `Shear for ${series.name}: largest ${q(v.value, u.V)} at ${q(v.at, u.x)} from the root, ${q(series.V[series.V.length - 1] ?? 0, u.V)} at the tip.`,
    deflection: `Deflection for ${series.name}: zero at the root, ${q(Math.abs(tip), u.deflection)} ${tip < 0 ? 'upward' : 'downward'} at the tip${
      limit ? `, against a limit of ${formatQuantity(limit)}` : ''
    }.`,
  };
}
