/** The series the elevation can show, its rows and plain-words summaries, from a result's stations. */
import type { Check, DesignResult, StationSeries } from '../../../../shared/engine/types';
import { convert, formatQuantity, type Quantity } from '../../../../shared/engine/units';
import { seriesFromCases } from '../../../lib/combination-series';

export { seriesFromCases };

/** A deflection check's limit, for the marker at the tip. */
export interface SeriesLimit {
  value: number;
  unit: string;
  /** "total-load" or "live-load". */
  which: string;
}

export interface SeriesChoice {
  key: string;
  label: string;
  /** A strength (or ASD) combination, a service combination of a deflection check, or one case. */
  kind: 'case' | 'combination' | 'service';
  series: StationSeries;
  /** Set when the series is the combination a deflection check uses: its limit applies to this curve. */
  limit?: SeriesLimit;
}

function checkLimit(check: Check, unit: string, which: string): SeriesLimit | undefined {
  if (!check.capacity) return undefined;
  return { value: convert(check.capacity.value, check.capacity.unit, unit), unit, which };
}

const DEFLECTION_CHECKS = [
  { id: 'member.deflection.total', which: 'total-load' },
  { id: 'member.deflection.live', which: 'live-load' },
] as const;

export function seriesChoices(result: DesignResult): SeriesChoice[] {
  const s = result.stations;
  if (!s) return [];
  const choices: SeriesChoice[] = s.combinations.map((series) => ({
    key: `combination:${series.name}`,
    label: series.name,
    kind: 'combination' as const,
    series,
  }));
  const cases: SeriesChoice[] = s.cases.map((series) => ({
    key: `case:${series.name}`,
    label: `${series.name} alone (unfactored)`,
    kind: 'case' as const,
    series,
  }));
  for (const { id, which } of DEFLECTION_CHECKS) {
    const check = result.checks.find((c) => c.id === id);
    const name = check?.combination;
    if (!check || !name) continue;
    const limit = checkLimit(check, s.units.deflection, which);
    const existing = [...choices, ...cases].find((c) => c.series.name === name);
    if (existing) {
      existing.limit ??= limit;
      continue;
    }
    const series = seriesFromCases(s, name);
    if (series)
      choices.push({
        key: `service:${name}`,
        label: `${name} (service, ${which} deflection)`,
        kind: 'service',
        series,
        limit,
      });
  }
  return [...choices, ...cases];
}

/** The default series: the combination that governs bending, else the first. */
export function defaultSeriesKey(result: DesignResult): string {
  const flexure = result.checks.find((c) => c.id === 'member.flexure');
  const choices = seriesChoices(result);
  const governing = choices.find((c) => c.kind === 'combination' && c.label === flexure?.combination);
  return (governing ?? choices[0])?.key ?? '';
}

/** The series a deflection check's limit belongs to (the total-load check first). */
export function limitSeriesKey(choices: readonly SeriesChoice[]): string | null {
  return (
    choices.find((c) => c.limit?.which === 'total-load')?.key ?? choices.find((c) => c.limit)?.key ?? null
  );
}

export interface ChartRow {
  x: number;
  M: number;
  V: number;
  d: number;
}

export function chartRows(x: readonly number[], series: StationSeries): ChartRow[] {
  return x.map((xi, i) => ({ x: xi, M: series.M[i], V: series.V[i], d: series.deflection[i] }));
}

/** The deflection limit (span = 2 × length) in the chart's deflection unit. */
export function deflectionLimit(result: DesignResult, ratio: number): Quantity | null {
  const s = result.stations;
  if (!s || s.x.length === 0 || !(ratio > 0)) return null;
  const length = s.x[s.x.length - 1];
  return { value: (2 * convert(length, s.units.x, s.units.deflection)) / ratio, unit: s.units.deflection };
}

/** The station with the largest magnitude: its value (signed) and its x. */
export function peak(values: readonly number[], x: readonly number[]): { value: number; at: number } {
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
