import type { Stations, StationSeries } from '../../shared/engine/types';

/**
 * A combination as the engine names its service combinations ("D + 0.75L + 0.75S") summed from the
 * unfactored case series; undefined when a term does not read or no case of it is present.
 */
export function seriesFromCases(stations: Stations, name: string): StationSeries | undefined {
  const terms = name.split('+').map((t) => /^\s*(\d*\.?\d*)\s*([A-Za-z]+)\s*$/.exec(t));
  if (terms.length === 0 || terms.some((t) => t === null)) return undefined;
  const n = stations.x.length;
  const out: StationSeries = {
    name,
    V: new Array<number>(n).fill(0),
    M: new Array<number>(n).fill(0),
    deflection: new Array<number>(n).fill(0),
  };
  let used = 0;
  for (const t of terms as RegExpExecArray[]) {
    const series = stations.cases.find((c) => c.name === t[2]);
    if (!series) continue;
    used += 1;
    const factor = t[1] ? Number(t[1]) : 1;
    for (let i = 0; i < n; i += 1) {
      out.V[i] += factor * series.V[i];
      out.M[i] += factor * series.M[i];
      out.deflection[i] += factor * series.deflection[i];
    }
  }
  return used > 0 ? out : undefined;
}
