/**
 * The fabricator's plate schedule: one row per connection, exported as CSV (RFC 4180: CRLF line
 * ends, fields with a comma, quote or line break quoted, quotes doubled). Dimensions in inches,
 * written the shop's way (1-1/2), whatever unit system the design uses.
 */
import type { ConnectionInput } from '../../schemas/connection';
import type { ConnectionResult } from '../types';
import { convert, toInternal, type Quantity } from '../units';
import { inchFraction } from './inch-fraction';
import { nextStandardThickness } from './plate-thickness';
import { rodEdgeMinimum } from './rod-positions';
import { rodSize } from './rod-data';

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

const inches = (text: string) => toInternal(text, 'length');
const toIn = (q: Quantity) => convert(q.value, q.unit, 'in');

/** One schedule row from a connection input and its result (result null: the requirement columns stay blank). */
export function plateScheduleRow(
  name: string,
  input: ConnectionInput,
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
    plateFy: String(Number(toInternal(input.plate.Fy ?? '36 ksi', 'stress').toPrecision(4))),
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

/** Quotes one CSV field per RFC 4180 when it needs it. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The schedule as CSV text: a header line and one line per row, CRLF line ends. */
export function plateScheduleCsv(rows: readonly PlateScheduleRow[]): string {
  const keys = Object.keys(HEADERS) as (keyof PlateScheduleRow)[];
  const lines = [keys.map((k) => csvField(HEADERS[k])), ...rows.map((r) => keys.map((k) => csvField(r[k])))];
  return lines.map((l) => l.join(',')).join('\r\n') + '\r\n';
}
