/**
 * The shop sketch of the connection, as data: a plan (post base) or an elevation (face plate) of
 * the plate with every dimension, a section with the embedment, the legend, and a table of the same
 * numbers. Built from the engine's own geometry (plateLayout, readGeometry), so the drawing cannot
 * say anything the checks did not use.
 */
import { readGeometry } from '../../../../shared/engine/connection/connection-geometry';
import { bearingZoneFromResult, plateLayout } from '../../../../shared/engine/connection/plate-layout';
import { rootOutline } from '../../../../shared/engine/connection/root-outline';
import { lookupWith } from '../../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import type { DesignResult } from '../../../../shared/engine/types';
import { formatQuantity, type Quantity, type UnitSystem } from '../../../../shared/engine/units';
import { parsedConnectionSchema } from '../../../../shared/schemas/parsed-design';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { lengthText, washerText } from './plate-drawing-format';
import { planView } from './plate-drawing-plan';
import { pierEdgeMinimum, plateOverhang, rodChecks, type RodRoles } from './plate-drawing-rules';
import { sectionView } from './plate-drawing-section';
import type { DrawingView, ShapeRole, Tone } from './plate-drawing-types';

export interface TableRow {
  id: string;
  what: string;
  text: string;
  tone: Tone;
  note?: string;
}

export interface LegendItem {
  symbol: ShapeRole;
  text: string;
}

export interface PlateDrawing {
  arrangement: 'post-base' | 'face-plate';
  title: string;
  desc: string;
  views: DrawingView[];
  legend: LegendItem[];
  rows: TableRow[];
  /** Words for every rod off the pier or the plate or too near an edge (empty when none). */
  problems: string[];
}

function rolesOf(result: DesignResult | null): RodRoles {
  const dir = result?.connection ? (result.connection as { direction?: string }).direction : undefined;
  if (dir === 'up') return { tension: 'compression', compression: 'tension' };
  if (dir === 'down') return { tension: 'tension', compression: 'compression' };
  return { tension: null, compression: null };
}

export function plateDrawing(
  doc: DesignDocument,
  result: DesignResult | null,
  custom: readonly ShapeRecord[] = [],
): PlateDrawing | null {
  const parsed = parsedConnectionSchema.safeParse(doc.connection);
  if (!doc.connection || !parsed.success) return null;
  const find = lookupWith(custom);
  const root = rootOutline(doc.member.section, find);
  if (!root) return null;
  const input = parsed.data;
  const units: UnitSystem = doc.units === 'SI' ? 'SI' : 'US';
  let layout, geo;
  try {
    layout = plateLayout(input, root, find);
    geo = readGeometry(input, root, find);
  } catch {
    return null;
  }
  const L = layout;
  const face = L.arrangement === 'face-plate';
  const roles = rolesOf(result);
  const pierMin = pierEdgeMinimum(geo.da, geo.torqued);
  const bearing = bearingZoneFromResult(L, result?.connection ?? null);
  const plan = planView({ layout: L, units, roles, grade: geo.grade, pierEdgeMinimum: pierMin, bearing });
  const postHeight = !face && input.post ? input.post.height.value : undefined;
  const section = sectionView({
    arrangement: L.arrangement,
    units,
    N: geo.N,
    t: geo.t,
    f: geo.f,
    hef: geo.hef,
    da: geo.da,
    washer: L.washer,
    pierLength: geo.pierLength,
    pierDepth: geo.pierDepth,
    postHeight,
    steelDepth: geo.footprint.ok ? geo.footprint.footprint.d : root.d,
  });
  const len = (v: number) => lengthText(v, units);
  const rows: TableRow[] = [];
  const seen = new Set<string>();
  for (const d of [...plan.dims, ...section.dims]) {
    if (seen.has(d.id)) continue;
    seen.add(d.id);
    const row: TableRow = { id: d.id, what: d.what, text: d.text, tone: d.tone };
    if (d.problem) row.note = d.problem;
    else if (d.minimum !== undefined) row.note = `at least ${len(d.minimum)}`;
    rows.push(row);
  }
  const rodRow: TableRow = {
    id: 'rods',
    what: 'Anchor rods',
    text: `${L.rods.length} x ${len(L.rodDiameter)} ${geo.grade}, ${geo.perSide} in each row, headed, cast in`,
    tone: 'ink',
  };
  rows.unshift(
    rodRow,
    {
      id: 'holes',
      what: 'Holes in the plate (AISC DG1 Table 2.3)',
      text: L.holeDiameter ? len(L.holeDiameter) : 'rod size not in the table',
      tone: L.holeDiameter ? 'ink' : 'warn',
    },
    {
      id: 'washers',
      what: 'Plate washers (AISC DG1 Table 2.3)',
      text: L.washer ? washerText(L.washer.size, L.washer.thickness, units) : 'rod size not in the table',
      tone: L.washer ? 'ink' : 'warn',
    },
    {
      id: 'steel',
      what: face ? 'Member on the plate' : 'Post on the plate',
      text: L.footprint.label,
      tone: 'ink',
    },
  );
  const Y = result?.connection?.bearingLength as Quantity | undefined;
  // Y is a result, not a cut length: written as the desk writes results (3 significant figures).
  if (Y)
    rows.push({
      id: 'bearing',
      what: `Bearing length Y from the compression edge (${result?.connection?.combination})`,
      text: formatQuantity(Y),
      tone: 'muted',
    });
  const problems = [
    ...plateOverhang(L, units),
    ...new Set(
      [...plan.dims, ...section.dims].filter((d) => d.problem).map((d) => `${d.what}: ${d.problem}`),
    ),
  ];
  const offending = rodChecks(L, pierMin).filter((c) => c.problems.length).length;
  const tensionWords = (result?.connection as { tensionRow?: string } | null)?.tensionRow;
  const legend: LegendItem[] = [
    {
      symbol: 'rod-tension',
      text: `rod in the tension row, solid${tensionWords ? ` (${tensionWords}, under ${result?.connection?.combination})` : ''}`,
    },
    { symbol: 'rod-compression', text: 'rod in the compression row, open ring with a centre dot' },
    { symbol: 'hole', text: 'hole in the plate' },
    { symbol: 'washer', text: 'plate washer (square)' },
    { symbol: 'bearing', text: 'bearing zone of the plate on the concrete (hatched)' },
    { symbol: 'warn-ring', text: 'red ring: rod off the pier or too near an edge, with the reason in red' },
  ];
  if (roles.tension === null)
    legend.splice(0, 2, { symbol: 'rod', text: 'rod (which row is in tension was not computed)' });
  if (!Y)
    legend.splice(
      legend.findIndex((l) => l.symbol === 'bearing'),
      1,
    );
  const title = face ? 'Face plate on the pier, shop sketch' : 'Base plate on the pier, shop sketch';
  const e = L.edgeDistances;
  const desc =
    `${face ? 'Face plate in elevation on the pier face' : 'Base plate in plan on the pier'}, with a section through a row of rods. ` +
    `Plate N ${len(L.plate.N)} by B ${len(L.plate.B)}, ${len(L.plate.thickness)} thick; pier ${len(L.pier.length)} by ${len(L.pier.width)}; ` +
    `${rodRow.text}, offset f ${len(geo.f)} from the plate centre${geo.perSide > 1 ? `, gauge ${len(geo.g)}` : ''}, embedment hef ${len(geo.hef)}; ` +
    `rod to plate edge ${len(e.rodToPlateAlongN)} along N and ${len(e.rodToPlateAlongB)} along B; rod to pier edge ${len(e.rodToPierAlongN)} along N and ${len(e.rodToPierAlongB)} along B. ` +
    (problems.length
      ? `Marked in red (${offending} of ${L.rods.length} rods): ${problems.join('; ')}.`
      : 'Every rod is on the pier and clear of the edges.');
  return { arrangement: L.arrangement, title, desc, views: [plan, section], legend, rows, problems };
}
