import type { Check, Stations, StationSeries } from '../../../../shared/engine/types';
import { convert } from '../../../../shared/engine/units';
import { seriesFromCases } from '../../../lib/combination-series';

export type Curve = 'V' | 'M' | 'deflection';

export interface Point {
  x: number;
  y: number;
}

/** mathjs reads "kip ft" as two units multiplied only when written with a * between them. */
function mathUnit(unit: string): string {
  return unit.trim().replace(/\s+/g, '*');
}

/** Converts a value between two result units; null when the units do not convert. */
export function convertValue(value: number, from: string, to: string): number | null {
  if (from === to) return value;
  try {
    const out = convert(value, mathUnit(from), mathUnit(to));
    return Number.isFinite(out) ? out : null;
  } catch {
    return null;
  }
}

/** The names of every case and combination either revision has stations for, combinations first. */
export function seriesNames(...all: (Stations | undefined)[]): string[] {
  const names: string[] = [];
  for (const s of all) for (const c of s?.combinations ?? []) if (!names.includes(c.name)) names.push(c.name);
  for (const s of all) for (const c of s?.cases ?? []) if (!names.includes(c.name)) names.push(c.name);
  return names;
}

function findSeries(stations: Stations, name: string): StationSeries | undefined {
  return (
    stations.combinations.find((c) => c.name === name) ??
    stations.cases.find((c) => c.name === name) ??
    seriesFromCases(stations, name)
  );
}

/** The service combination of the total-load deflection check ("D + L"), which the limit line belongs to. */
export function serviceName(checks: Check[]): string | undefined {
  return checks.find((c) => c.id === 'member.deflection.total')?.combination ?? undefined;
}

/**
 * One curve of one revision as points in the units of `target` (the other revision's stations),
 * so the two revisions overlay even when one of them was saved in other units.
 */
export function curvePoints(
  stations: Stations,
  name: string,
  curve: Curve,
  target: Stations['units'],
): Point[] | null {
  const series = findSeries(stations, name);
  if (!series) return null;
  const ys = series[curve];
  const points: Point[] = [];
  for (let i = 0; i < stations.x.length; i += 1) {
    const x = convertValue(stations.x[i], stations.units.x, target.x);
    const y = convertValue(ys[i], stations.units[curve], target[curve]);
    if (x === null || y === null) return null;
    points.push({ x, y });
  }
  return points;
}

/** The combination that governs bending in the later revision, else the first one there is. */
export function governingName(checks: Check[], names: string[]): string | undefined {
  const flexure = checks.find((c) => c.id === 'member.flexure')?.combination;
  return flexure && names.includes(flexure) ? flexure : names[0];
}

/** The total-load deflection limit of a revision in `unit`, from its own check's capacity. */
export function deflectionLimit(checks: Check[], unit: string): number | null {
  const check = checks.find((c) => c.id === 'member.deflection.total');
  if (!check?.capacity) return null;
  return convertValue(check.capacity.value, check.capacity.unit, unit);
}
