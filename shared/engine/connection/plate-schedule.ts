/**
 * The fabricator's plate schedule: one row per connection, exported as CSV through the shared
 * writer (shared/csv/csv-writer.ts: RFC 4180, cells neutralised against formula injection). Dimensions in inches,
 * written the shop's way (1-1/2), whatever unit system the design uses.
 */
import type { ParsedConnection, ParsedQuantity } from '../../schemas/parsed-design';
import type { ConnectionResult } from '../types';
import { convert, type Quantity } from '../units';
import { inchFraction } from './inch-fraction';
import { nextStandardThickness } from './plate-thickness';
import { rodEdgeMinimum } from './rod-positions';
import { rodSize } from './rod-data';
import { csvText } from '../../csv/csv-writer';

export interface PlateScheduleRow {
  mark: string;
  arrangement: string;
  plate: string;
  plateFy: string;
  rods: string;
  rodGrade: string;
  rowOffset: string;
  gauge: string;
  embedment: string;
  holeDiameter: string;
  washer: string;
  minEdgeDistance: string;
  requiredThickness: string;
  nextStandardThickness: string;
  governingCombination: string;
}

const HEADERS: Record<keyof PlateScheduleRow, string> = {
  mark: 'Mark',
  arrangement: 'Arrangement',
  plate: 'Plate N x B x t (in)',
  plateFy: 'Plate Fy (ksi)',
  rods: 'Rods (count x dia, in)',
  rodGrade: 'Rod grade',
  rowOffset: 'Row offset f (in)',
  gauge: 'Gauge (in)',
  embedment: 'Embedment hef (in)',
  holeDiameter: 'Hole dia (in)',
  washer: 'Plate washer (in)',
  minEdgeDistance: 'Min rod edge distance (in)',
  requiredThickness: 'Required t (in)',
  nextStandardThickness: 'Next stock t (in)',
  governingCombination: 'Governing combination',
};

const inches = (q: ParsedQuantity) => q.value;
const toIn = (q: Quantity) => convert(q.value, q.unit, 'in');

/** One schedule row from a connection input and its result (result null: the requirement columns stay blank). */
export function plateScheduleRow(
  name: string,
  input: ParsedConnection,
  result: ConnectionResult | null,
): PlateScheduleRow {
  const a = input.anchors;
  const da = inches(a.diameter);
  const rod = rodSize(da);
  const required = result ? toIn(result.requiredThickness) : null;
  return {
    mark: name,
    arrangement: input.arrangement,
    plate: `${inchFraction(inches(input.plate.N))} x ${inchFraction(inches(input.plate.B))} x ${inchFraction(inches(input.plate.thickness))}`,
    plateFy: String(Number(input.plate.Fy.value.toPrecision(4))),
    rods: `${2 * a.perSide} x ${inchFraction(da)}`,
    rodGrade: `ASTM ${a.grade.replace('-', ' Gr ')}`,
    rowOffset: inchFraction(inches(a.offset)),
    gauge: a.perSide > 1 ? inchFraction(inches(a.gauge)) : '',
    embedment: inchFraction(inches(a.embedment)),
    holeDiameter: rod ? inchFraction(rod.hole) : 'not tabulated',
    washer: rod
      ? `${inchFraction(rod.washerSize)} x ${inchFraction(rod.washerSize)} x ${inchFraction(rod.washerThickness)}`
      : 'not tabulated',
    minEdgeDistance: rod ? inchFraction(rodEdgeMinimum(rod)) : '',
    requiredThickness: required === null ? '' : required.toFixed(3),
    nextStandardThickness: required === null ? '' : inchFraction(nextStandardThickness(required)),
    governingCombination: result?.combination ?? '',
  };
}

/** The schedule's columns in order, with their header words. */
export function plateScheduleHeaders(): [keyof PlateScheduleRow, string][] {
  return (Object.keys(HEADERS) as (keyof PlateScheduleRow)[]).map((k) => [k, HEADERS[k]]);
}

/** Extra columns written before the schedule's own (revision, state, quantity…), with their values. */
export interface ScheduleLine {
  before: Record<string, string>;
  row: PlateScheduleRow;
}

/**
 * The schedule as CSV text: a header line, one line per row, and then `footer` lines (the caution),
 * through the shared CSV writer. `extra` names the columns put before the schedule's own.
 */
export function plateScheduleCsv(
  rows: readonly (PlateScheduleRow | ScheduleLine)[],
  extra: readonly string[] = [],
  footer: readonly string[] = [],
): string {
  const cols = plateScheduleHeaders();
  const lines = [
    [...extra, ...cols.map(([, h]) => h)],
    ...rows.map((r) => {
      const line: ScheduleLine = 'row' in r ? r : { before: {}, row: r };
      return [...extra.map((e) => line.before[e] ?? ''), ...cols.map(([k]) => line.row[k])];
    }),
    ...footer.map((f) => [f]),
  ];
  return csvText(lines);
}
