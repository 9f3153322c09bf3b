/**
 * The plate as the fabricator lays it out: in plan on the pier for a post base (N across, B up the
 * page), or in elevation on the face of the pier for a face plate (N up the page, B across). Chains
 * of dimensions on all four sides: the plate and its rods above (or left), the pier below (or right).
 */
import type { PlateLayout, Rect } from '../../../../shared/engine/connection/plate-layout';
import type { UnitSystem } from '../../../../shared/engine/units';
import { chain, type Station } from './plate-drawing-dims';
import { FONT, lengthText, textWidth, washerText } from './plate-drawing-format';
import { plateOverhang, rodChecks, segmentFor, type RodRoles } from './plate-drawing-rules';
import type { Box, Callout, Dimension, DrawingView, Label, Shape } from './plate-drawing-types';

export const PLAN_WIDTH = 620;
const TIER = 30;
const LINE = 20;

export interface PlanInput {
  layout: PlateLayout;
  units: UnitSystem;
  roles: RodRoles;
  grade: string;
  /** Least rod centre to pier edge, in (anchors.layout). */
  pierEdgeMinimum: number;
  bearing: Rect | null;
}

function note(
  text: string,
  x: number,
  y: number,
  tone: Label['tone'],
  anchor: Label['anchor'] = 'start',
): Label {
  const w = textWidth(text);
  const x0 = anchor === 'start' ? x : anchor === 'end' ? x - w : x - w / 2;
  return {
    text,
    x,
    y,
    anchor,
    vertical: false,
    tone,
    box: { x0, y0: y - 0.78 * FONT, x1: x0 + w, y1: y + 0.22 * FONT },
  };
}

export function planView(p: PlanInput): DrawingView {
  const L = p.layout;
  const face = L.arrangement === 'face-plate';
  const rods = L.rods;
  // Extents in plate coordinates (x along N, y along B).
  const xs = [L.plate.x0, L.plate.x1, L.pier.x0, L.pier.x1, ...rods.map((r) => r.x)];
  const ys = [L.plate.y0, L.plate.y1, L.pier.y0, L.pier.y1, ...rods.map((r) => r.y)];
  const [xMin, xMax, yMin, yMax] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  // Screen u (across) and v (down): plan N -> u, B -> -v; face N -> -v, B -> u.
  const spanU = face ? yMax - yMin : xMax - xMin;
  const spanV = face ? xMax - xMin : yMax - yMin;
  const side = 2 * TIER + 24;
  const top = 3 * LINE + 12 + side;
  const k = Math.min((PLAN_WIDTH - 2 * side) / spanU, 420 / spanV);
  const u0 = (PLAN_WIDTH - spanU * k) / 2;
  const U = (x: number, y: number) => (face ? u0 + (y - yMin) * k : u0 + (x - xMin) * k);
  const V = (x: number, y: number) => (face ? top + (xMax - x) * k : top + (yMax - y) * k);
  const box = (r: Rect): Box => {
    const [a, b] = [U(r.x0, r.y0), U(r.x1, r.y1)];
    const [c, d] = [V(r.x0, r.y0), V(r.x1, r.y1)];
    return { x0: Math.min(a, b), y0: Math.min(c, d), x1: Math.max(a, b), y1: Math.max(c, d) };
  };
  const outline: Box = { x0: u0, y0: top, x1: u0 + spanU * k, y1: top + spanV * k };
  const plateBox = box(L.plate);
  const pierBox = box(L.pier);

  const shapes: Shape[] = [
    { kind: 'rect', role: 'pier', box: pierBox },
    { kind: 'rect', role: 'plate', box: plateBox },
  ];
  if (p.bearing && p.bearing.x1 > p.bearing.x0)
    shapes.push({ kind: 'rect', role: 'bearing', box: box(p.bearing) });
  const fp = L.footprint;
  if (fp.kind === 'I' || fp.kind === 'C')
    for (const r of fp.rects) shapes.push({ kind: 'rect', role: 'steel', box: box(r) });
  else if (fp.kind === 'box') {
    shapes.push(
      { kind: 'rect', role: 'steel', box: box(fp.outer) },
      { kind: 'rect', role: 'steel-void', box: box(fp.inner) },
    );
  } else if (fp.kind === 'round') {
    const [cx, cy] = [U(0, 0), V(0, 0)];
    shapes.push(
      { kind: 'circle', role: 'steel', cx, cy, r: fp.outerRadius * k },
      { kind: 'circle', role: 'steel-void', cx, cy, r: fp.innerRadius * k },
    );
  }
  const cl = 12;
  shapes.push(
    { kind: 'path', role: 'centre-line', d: `M${outline.x0 - cl},${V(0, 0)}H${outline.x1 + cl}` },
    { kind: 'path', role: 'centre-line', d: `M${U(0, 0)},${outline.y0 - cl}V${outline.y1 + cl}` },
  );
  const checks = rodChecks(L, p.pierEdgeMinimum);
  rods.forEach((r, i) => {
    const [cx, cy] = [U(r.x, r.y), V(r.x, r.y)];
    if (L.washer) {
      const h = (L.washer.size * k) / 2;
      shapes.push({ kind: 'rect', role: 'washer', box: { x0: cx - h, y0: cy - h, x1: cx + h, y1: cy + h } });
    }
    if (L.holeDiameter) shapes.push({ kind: 'circle', role: 'hole', cx, cy, r: (L.holeDiameter * k) / 2 });
    const role = p.roles[r.row];
    shapes.push({
      kind: 'circle',
      role: role === 'tension' ? 'rod-tension' : role === 'compression' ? 'rod-compression' : 'rod',
      cx,
      cy,
      r: Math.max(2.5, (L.rodDiameter * k) / 2),
    });
    if (checks[i].problems.length)
      shapes.push({
        kind: 'circle',
        role: 'warn-ring',
        cx,
        cy,
        r: Math.max(9, ((L.washer?.size ?? L.rodDiameter) * k) / 1.4),
      });
  });

  // Stations along N and along B, with the screen coordinate of each along its axis.
  const alongN = (v: number) => (face ? V(v, 0) : U(v, 0));
  const alongB = (v: number) => (face ? U(0, v) : V(0, v));
  const rowXs = [...new Set(rods.map((r) => r.x))];
  const rowYs = [...new Set(rods.map((r) => r.y))].sort((a, b) => a - b);
  const ySpan = rowYs.length > 1 ? [rowYs[0], rowYs[rowYs.length - 1]] : rowYs;
  // The edge of the outline each chain stands on.
  const nearN = face ? outline.x0 : outline.y0; // plate chains along N: left (face) or top (plan)
  const farN = face ? outline.x1 : outline.y1;
  const nearB = face ? outline.y0 : outline.x0;
  const farB = face ? outline.y1 : outline.x1;
  const nAxis = face ? 'y' : 'x';
  const bAxis = face ? 'x' : 'y';
  const vertical: [number, number] = [outline.y0 - side + 8, outline.y1 + side - 8];
  const across: [number, number] = [4, PLAN_WIDTH - 4];
  const nBounds = face ? vertical : across;
  const bBounds = face ? across : vertical;
  const plateN = face ? plateBox.x0 : plateBox.y0;
  const pierN = face ? pierBox.x1 : pierBox.y1;
  const plateB = face ? plateBox.y0 : plateBox.x0;
  const pierB = face ? pierBox.y1 : pierBox.x1;
  const rodU = rods.map((r) => U(r.x, r.y));
  const rodV = rods.map((r) => V(r.x, r.y));
  // Where the extension lines of the rods start: the rod nearest the chain's side.
  const rodNear = (tag: 'plate' | 'pier') =>
    face
      ? tag === 'plate'
        ? Math.min(...rodU)
        : Math.max(...rodU)
      : tag === 'plate'
        ? Math.min(...rodV)
        : Math.max(...rodV);
  const rodNearB = (tag: 'plate' | 'pier') =>
    face
      ? tag === 'plate'
        ? Math.min(...rodV)
        : Math.max(...rodV)
      : tag === 'plate'
        ? Math.min(...rodU)
        : Math.max(...rodU);
  const st = (at: number, value: number, tag: Station['tag'], feature: number): Station => ({
    at,
    value,
    tag,
    feature,
  });
  const describe = segmentFor(L, p.units, p.pierEdgeMinimum);
  const dims: Dimension[] = [
    ...chain({
      axis: nAxis,
      line: nearN - TIER,
      side: -1,
      units: p.units,
      bounds: nBounds,
      describe: describe('N'),
      stations: [
        st(alongN(L.plate.x0), L.plate.x0, 'plate', plateN),
        st(alongN(L.plate.x1), L.plate.x1, 'plate', plateN),
        st(alongN(0), 0, 'centre', nearN),
        ...rowXs.map((x) => st(alongN(x), x, 'rod', rodNear('plate'))),
      ],
    }),
    ...chain({
      axis: nAxis,
      line: nearN - 2 * TIER,
      side: -1,
      units: p.units,
      bounds: nBounds,
      describe: () => ({ id: 'plate.N', what: 'Plate length N (along the moment)' }),
      stations: [
        st(alongN(L.plate.x0), L.plate.x0, 'plate', plateN),
        st(alongN(L.plate.x1), L.plate.x1, 'plate', plateN),
      ],
    }),
    ...chain({
      axis: nAxis,
      line: farN + TIER,
      side: 1,
      units: p.units,
      bounds: nBounds,
      describe: describe('N'),
      stations: [
        st(alongN(L.pier.x0), L.pier.x0, 'pier', pierN),
        st(alongN(L.pier.x1), L.pier.x1, 'pier', pierN),
        ...rowXs.map((x) => st(alongN(x), x, 'rod', rodNear('pier'))),
      ],
    }),
    ...chain({
      axis: nAxis,
      line: farN + 2 * TIER,
      side: 1,
      units: p.units,
      bounds: nBounds,
      describe: () => ({ id: 'pier.length', what: face ? 'Pier face along N' : 'Pier length along N' }),
      stations: [
        st(alongN(L.pier.x0), L.pier.x0, 'pier', pierN),
        st(alongN(L.pier.x1), L.pier.x1, 'pier', pierN),
      ],
    }),
    ...chain({
      axis: bAxis,
      line: nearB - TIER,
      side: -1,
      units: p.units,
      bounds: bBounds,
      describe: describe('B'),
      stations: [
        st(alongB(L.plate.y0), L.plate.y0, 'plate', plateB),
        st(alongB(L.plate.y1), L.plate.y1, 'plate', plateB),
        ...ySpan.map((y) => st(alongB(y), y, 'rod', rodNearB('plate'))),
      ],
    }),
    ...chain({
      axis: bAxis,
      line: nearB - 2 * TIER,
      side: -1,
      units: p.units,
      bounds: bBounds,
      describe: () => ({ id: 'plate.B', what: 'Plate width B' }),
      stations: [
        st(alongB(L.plate.y0), L.plate.y0, 'plate', plateB),
        st(alongB(L.plate.y1), L.plate.y1, 'plate', plateB),
      ],
    }),
    ...chain({
      axis: bAxis,
      line: farB + TIER,
      side: 1,
      units: p.units,
      bounds: bBounds,
      describe: describe('B'),
      stations: [
        st(alongB(L.pier.y0), L.pier.y0, 'pier', pierB),
        st(alongB(L.pier.y1), L.pier.y1, 'pier', pierB),
        ...ySpan.map((y) => st(alongB(y), y, 'rod', rodNearB('pier'))),
      ],
    }),
    ...chain({
      axis: bAxis,
      line: farB + 2 * TIER,
      side: 1,
      units: p.units,
      bounds: bBounds,
      describe: () => ({ id: 'pier.width', what: face ? 'Pier face along B' : 'Pier width along B' }),
      stations: [
        st(alongB(L.pier.y0), L.pier.y0, 'pier', pierB),
        st(alongB(L.pier.y1), L.pier.y1, 'pier', pierB),
      ],
    }),
  ];

  // Callouts in the band above the drawing: the section at the left, the rods at the right.
  const callouts: Callout[] = [];
  const bandY = (i: number) => LINE * (i + 1);
  const rodText = [
    `${rods.length} rods ${lengthText(L.rodDiameter, p.units)} ${p.grade}`,
    L.holeDiameter
      ? `holes ${lengthText(L.holeDiameter, p.units)} (DG1 Table 2.3)`
      : 'holes: rod size not in DG1 Table 2.3',
    L.washer
      ? `plate washers ${washerText(L.washer.size, L.washer.thickness, p.units)}`
      : 'plate washers: size not tabulated',
  ];
  const corner = rods.reduce(
    (a, r) => (U(r.x, r.y) - V(r.x, r.y) > U(a.x, a.y) - V(a.x, a.y) ? r : a),
    rods[0],
  );
  const rodLabels = rodText.map((t, i) => note(t, PLAN_WIDTH - 4, bandY(i), 'ink', 'end'));
  const rodLeft = Math.min(...rodLabels.map((l) => l.box.x0));
  callouts.push({
    from: { x: U(corner.x, corner.y), y: V(corner.x, corner.y) },
    to: { x: rodLeft - 6, y: bandY(2) + 4 },
    labels: rodLabels,
  });
  const steelLabel = note(`${face ? 'member' : 'post'} ${fp.label}`, 4, bandY(0), 'ink');
  const fpAt = { x: U(0, 0), y: V(0, 0) };
  callouts.push({ from: fpAt, to: { x: steelLabel.box.x1 + 6, y: bandY(0) + 4 }, labels: [steelLabel] });

  const dimBottom = Math.max(...dims.map((d) => Math.max(d.label.box.y1, d.line[0].y, d.line[1].y)));
  const notes: Label[] = [];
  let y = Math.max(dimBottom, outline.y1) + LINE + 4;
  notes.push(
    note(
      face
        ? 'Elevation on the pier face; up ↑, the member comes out toward you'
        : 'Plan on the pier; the member reaches to the left ←',
      4,
      y,
      'muted',
    ),
  );
  const problems = [
    ...plateOverhang(L, p.units),
    ...dims.filter((d) => d.problem).map((d) => `${d.what}: ${d.problem}`),
  ];
  for (const words of new Set(problems)) {
    y += LINE;
    notes.push(note(`⚠ ${words}`, 4, y, 'warn'));
  }
  return {
    id: face ? 'face' : 'plan',
    title: face ? 'Face plate in elevation on the pier' : 'Base plate in plan on the pier',
    width: PLAN_WIDTH,
    height: y + 10,
    shapes,
    dims,
    callouts,
    notes,
    keepClear: [plateBox],
  };
}
