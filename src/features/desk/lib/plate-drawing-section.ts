/**
 * The section through a row of rods: the embedment hef below the concrete surface, the plate
 * thickness, the pier depth when the document gives it, the post height for a post base. A post
 * base stands on the pier with the section vertical; a face plate's section is turned a quarter,
 * the concrete on the left and the member reaching right. What the document does not set (grout
 * thickness, rod projection) is drawn schematic and said to be so, never dimensioned.
 */
import type { UnitSystem } from '../../../../shared/engine/units';
import { chain, type Station } from './plate-drawing-dims';
import { FONT, textWidth } from './plate-drawing-format';
import type { Box, Callout, Dimension, DrawingView, Label, Pt, Shape } from './plate-drawing-types';

export const SECTION_WIDTH = 400;
const TIER = 30;
const LINE = 20;
/** Schematic only: the document has no grout thickness; 1 in keeps the bed visible. */
const GROUT_DRAWN = 1;

export interface SectionInput {
  arrangement: 'post-base' | 'face-plate';
  units: UnitSystem;
  N: number;
  t: number;
  f: number;
  hef: number;
  da: number;
  washer: { size: number; thickness: number } | null;
  pierLength: number;
  pierDepth: number | undefined;
  postHeight: number | undefined;
  /** Depth of the section on the plate along N, in. */
  steelDepth: number;
}

function text(
  t: string,
  x: number,
  y: number,
  tone: Label['tone'],
  anchor: Label['anchor'] = 'start',
): Label {
  const w = textWidth(t);
  const x0 = anchor === 'start' ? x : anchor === 'end' ? x - w : x - w / 2;
  return {
    text: t,
    x,
    y,
    anchor,
    vertical: false,
    tone,
    box: { x0, y0: y - 0.78 * FONT, x1: x0 + w, y1: y + 0.22 * FONT },
  };
}

export function sectionView(p: SectionInput): DrawingView {
  const face = p.arrangement === 'face-plate';
  const grout = face ? 0 : GROUT_DRAWN;
  const nutH = p.da;
  const projection = 0.5 * p.da;
  const washerT = p.washer?.thickness ?? 0;
  const rodTop = -(grout + p.t + washerT + nutH + projection);
  const stub = p.postHeight ?? Math.max(6, p.steelDepth);
  const above = Math.max(-rodTop, grout + p.t + stub);
  const deep = p.pierDepth ?? p.hef + Math.max(6, 0.5 * p.hef);
  const sHalf = Math.max(p.pierLength, p.N) / 2;
  const margin = 2 * TIER + 24;
  const band = 2 * LINE + 12;
  const availS = face ? 420 : SECTION_WIDTH - 2 * margin;
  const availD = face ? SECTION_WIDTH - 2 * margin : 420;
  const k = Math.min(availS / (2 * sHalf), availD / (above + deep));
  // s along N, d into the concrete (negative above the surface).
  const top = band + margin;
  const P = (s: number, d: number): Pt =>
    face
      ? { x: margin + deep * k - d * k, y: top + (sHalf - s) * k }
      : { x: SECTION_WIDTH / 2 + s * k, y: top + (above + d) * k };
  const B = (s0: number, s1: number, d0: number, d1: number): Box => {
    const [a, b] = [P(s0, d0), P(s1, d1)];
    return { x0: Math.min(a.x, b.x), y0: Math.min(a.y, b.y), x1: Math.max(a.x, b.x), y1: Math.max(a.y, b.y) };
  };
  const concrete = B(-p.pierLength / 2, p.pierLength / 2, 0, deep);
  const plate = B(-p.N / 2, p.N / 2, -grout - p.t, -grout);
  const steel = B(-p.steelDepth / 2, p.steelDepth / 2, -grout - p.t - stub, -grout - p.t);
  const shapes: Shape[] = [{ kind: 'rect', role: 'pier', box: concrete }];
  if (grout) shapes.push({ kind: 'rect', role: 'grout', box: B(-p.N / 2, p.N / 2, -grout, 0) });
  shapes.push({ kind: 'rect', role: 'plate', box: plate }, { kind: 'rect', role: 'steel', box: steel });
  const breakAt = (b: Box, end: 'far' | 'steel') => {
    // A zig-zag across the cut end: the bottom of a deep pier, or the post or member beyond the view.
    const horizontal = !face;
    const edge = horizontal ? (end === 'far' ? b.y1 : b.y0) : end === 'far' ? b.x0 : b.x1;
    const [a0, a1] = horizontal ? [b.x0 - 6, b.x1 + 6] : [b.y0 - 6, b.y1 + 6];
    const m = (a0 + a1) / 2;
    const pts = [a0, m - 6, m, m + 6, a1].map((a, i) => {
      const o = i === 1 ? -6 : i === 3 ? 6 : 0;
      return horizontal ? `${a},${edge + o}` : `${edge + o},${a}`;
    });
    shapes.push({ kind: 'path', role: 'break', d: `M${pts.join('L')}` });
  };
  if (p.pierDepth === undefined) breakAt(concrete, 'far');
  if (p.postHeight === undefined) breakAt(steel, 'steel');
  for (const s of [-p.f, p.f]) {
    shapes.push({ kind: 'rect', role: 'rod-side', box: B(s - p.da / 2, s + p.da / 2, rodTop, p.hef) });
    shapes.push({
      kind: 'rect',
      role: 'head',
      box: B(s - 0.8 * p.da, s + 0.8 * p.da, p.hef, p.hef + 0.6 * p.da),
    });
    if (p.washer)
      shapes.push({
        kind: 'rect',
        role: 'washer',
        box: B(s - p.washer.size / 2, s + p.washer.size / 2, -grout - p.t - washerT, -grout - p.t),
      });
    const flats = 1.5 * p.da + 0.125;
    shapes.push({
      kind: 'rect',
      role: 'nut',
      box: B(s - flats / 2, s + flats / 2, -grout - p.t - washerT - nutH, -grout - p.t - washerT),
    });
  }

  // Depth chains run along the depth axis: screen y for a post base, x for a face plate.
  const axis = face ? 'x' : 'y';
  const along = (d: number) => (face ? P(0, d).x : P(0, d).y);
  const nearLine = face ? concrete.y1 + TIER : concrete.x0 - TIER;
  const farLine = face
    ? Math.min(plate.y0, concrete.y0, steel.y0) - TIER
    : Math.max(plate.x1, concrete.x1, steel.x1) + TIER;
  const rodFeature = face ? P(-p.f, 0).y : P(-p.f, 0).x;
  const st = (d: number, tag: Station['tag'], feature: number): Station => ({
    at: along(d),
    value: d,
    tag,
    feature,
  });
  const bounds: [number, number] = face ? [4, SECTION_WIDTH - 4] : [band + 4, 10_000];
  const nearEdge = face ? concrete.y1 : concrete.x0;
  const farEdge = face ? plate.y0 : plate.x1;
  const tier = (side: 'near' | 'far', n: number) =>
    side === 'near'
      ? face
        ? nearLine + (n - 1) * TIER
        : nearLine - (n - 1) * TIER
      : face
        ? farLine - (n - 1) * TIER
        : farLine + (n - 1) * TIER;
  const sideOf = (side: 'near' | 'far'): -1 | 1 =>
    face ? (side === 'near' ? 1 : -1) : side === 'near' ? -1 : 1;
  const hefStations = [st(0, 'surface', nearEdge), st(p.hef, 'head', rodFeature)];
  if (p.pierDepth !== undefined) hefStations.push(st(p.pierDepth, 'bottom', nearEdge));
  const dims: Dimension[] = chain({
    axis,
    line: tier('near', 1),
    side: sideOf('near'),
    units: p.units,
    bounds,
    stations: hefStations,
    describe: (a, b) => {
      if (a.tag === 'surface' || b.tag === 'surface')
        return {
          id: 'rods.embedment',
          what: 'Embedment hef, concrete surface to the bearing face of the head',
        };
      const short = Math.abs(b.value - a.value) < 2 - 1e-9;
      return {
        id: 'pier.beyondHeads',
        what: 'Concrete beyond the heads',
        minimum: 2,
        ...(short
          ? { tone: 'warn' as const, problem: 'less than the 2 in cover anchors.layout asks for' }
          : {}),
      };
    },
  });
  if (p.pierDepth !== undefined)
    dims.push(
      ...chain({
        axis,
        line: tier('near', 2),
        side: sideOf('near'),
        units: p.units,
        bounds,
        describe: () => ({ id: 'pier.depth', what: face ? 'Concrete depth along the rods' : 'Pier depth' }),
        stations: [st(0, 'surface', nearEdge), st(p.pierDepth, 'bottom', nearEdge)],
      }),
    );
  dims.push(
    ...chain({
      axis,
      line: tier('far', 1),
      side: sideOf('far'),
      units: p.units,
      bounds,
      describe: () => ({ id: 'plate.thickness', what: 'Plate thickness t' }),
      stations: [st(-grout, 'plate', farEdge), st(-grout - p.t, 'plate', farEdge)],
    }),
  );
  if (!face && p.postHeight !== undefined)
    dims.push(
      ...chain({
        axis,
        line: tier('far', 2),
        side: 1,
        units: p.units,
        bounds,
        describe: () => ({ id: 'post.height', what: "Post, top of plate to the beam's centreline" }),
        stations: [st(-grout - p.t, 'plate', steel.x1), st(-grout - p.t - p.postHeight, 'top', steel.x1)],
      }),
    );

  // The grout note on the first line, its leader ending left of the text; the projection below it.
  const lines = [
    text(face ? 'plate on the concrete, no grout' : 'grout: thickness not in the design', 24, LINE, 'muted'),
    text('rod projection: not in the design', 24, 2 * LINE, 'muted'),
  ];
  const callouts: Callout[] = [
    {
      from: P(face ? p.f : -p.f, rodTop),
      to: { x: lines[1].box.x0 + 40, y: 2 * LINE + 4 },
      labels: [lines[1]],
    },
  ];
  if (!face) callouts.push({ from: P(-p.N / 2, -grout / 2), to: { x: 8, y: LINE - 5 }, labels: [lines[0]] });
  const bottom = Math.max(
    concrete.y1,
    ...dims.map((d) => Math.max(d.label.box.y1, d.line[0].y, d.line[1].y)),
  );
  const notes: Label[] = [];
  let y = bottom + LINE + 4;
  notes.push(
    text(
      face ? 'Section through a row of rods; up ↑' : 'Section through a row of rods along N',
      4,
      y,
      'muted',
    ),
  );
  if (p.pierDepth === undefined) {
    y += LINE;
    notes.push(text('pier depth not given: drawn broken', 4, y, 'muted'));
  }
  if (face) notes.push(lines[0]);
  return {
    id: 'section',
    title: face ? 'Section through the face plate and the pier' : 'Section through the plate and the pier',
    width: SECTION_WIDTH,
    height: y + 10,
    shapes,
    dims,
    callouts,
    notes,
    keepClear: [plate],
  };
}
