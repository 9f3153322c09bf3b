/**
 * The member in elevation with its support, to scale, for the elevation panel: the beam's depth
 * along x from the stations (top flange level, the taper on the underside), and behind the root the
 * post, plate, rods and pier (post base) or the plate on the face of the pier (face plate), from the
 * engine's own plate layout. Inches; x from the root toward the tip (the support is at x < 0), y
 * downward from the beam's top flange.
 */
import type { DesignResult } from '../../../../shared/engine/types';
import { convert, parseQuantity } from '../../../../shared/engine/units';
import type { DesignDocument } from '../../../../shared/schemas/design';
import { platePlan } from './plate-plan';

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export interface ElevationShape {
  /** Station x (in) and the section depth there (in). */
  beam: { x: number[]; depth: number[] };
  length: number;
  arrangement: 'post-base' | 'face-plate' | 'none';
  pier: Box | null;
  /** True when the pier is drawn shorter than it is (a break line at the cut edge). */
  pierCut: boolean;
  plate: Box | null;
  post: Box | null;
  rods: (Box & { row: 'tension' | 'compression' })[];
  /** Inches behind the root the drawing needs, and its depth below the top flange. */
  behind: number;
  below: number;
  /** Words for what is assumed in the drawing (e.g. a post height that is not given). */
  notes: string[];
}

function inches(text: string | undefined): number | null {
  if (!text) return null;
  const r = parseQuantity(text, 'length');
  return r.ok && r.value > 0 ? r.value : null;
}

/** Concrete drawn below the rods' ends before the break line. */
const BELOW_RODS = 4;

export function elevationShape(result: DesignResult, doc: DesignDocument | null): ElevationShape | null {
  const s = result.stations;
  if (!s || s.x.length < 2) return null;
  const small = s.units.deflection;
  // One factor per unit (a mathjs conversion per station costs more than the rest of the drawing).
  const fx = convert(1, s.units.x, 'in');
  const fd = convert(1, small, 'in');
  const x = s.x.map((v) => v * fx);
  const depth = s.depth.map((d) => d * fd);
  const length = x[x.length - 1];
  const root = depth[0];
  const base: ElevationShape = {
    beam: { x, depth },
    length,
    arrangement: 'none',
    pier: null,
    pierCut: false,
    plate: null,
    post: null,
    rods: [],
    behind: Math.max(2, length * 0.03),
    below: Math.max(...depth),
    notes: [],
  };
  const plan = doc ? platePlan(doc, result) : null;
  if (!plan || !doc?.connection) return base;
  const { layout } = plan;
  const t = layout.plate.thickness;
  const embedment = inches(doc.connection.anchors.embedment) ?? 0;
  const rodX = layout.rods.map((r) => ({ at: r.x, row: r.row }));
  const rowsAt = [...new Map(rodX.map((r) => [r.at, r])).values()];
  if (layout.arrangement === 'face-plate') {
    // The plate on the pier's face, N upright and centred on the beam's centreline; the tension row on top.
    const centre = root / 2;
    const wall = inches(doc.connection.pier.depth) ?? embedment + BELOW_RODS + 2;
    const drawnWall = Math.min(wall, embedment + BELOW_RODS + 2);
    const half = layout.pier.length / 2;
    return {
      ...base,
      arrangement: 'face-plate',
      plate: { x0: -t, y0: centre - layout.plate.N / 2, x1: 0, y1: centre + layout.plate.N / 2 },
      pier: { x0: -t - drawnWall, y0: centre - half, x1: -t, y1: centre + half },
      pierCut: drawnWall < wall,
      rods: rowsAt.map((r) => ({
        x0: -t - embedment,
        x1: 1,
        y0: centre - r.at,
        y1: centre - r.at,
        row: r.row,
      })),
      behind: t + drawnWall,
      below: Math.max(base.below, centre + half, centre + layout.plate.N / 2),
    };
  }
  // Post base: the post (its footprint section, or the member's root) stands on the plate and holds
  // the root at its face; the plate and pier are centred under the post, the tension row behind it.
  const postDepth = footprintDepth(layout) ?? root;
  const given = inches(doc.connection.post?.height);
  const height = given ?? root / 2;
  const notes = given ? [] : ['No post height given: the root is drawn directly on the plate.'];
  const plateTop = root / 2 + height;
  const centre = -postDepth / 2;
  const pierTop = plateTop + t;
  const pierDrawn = embedment + BELOW_RODS;
  const halfN = layout.plate.N / 2;
  const halfPier = layout.pier.length / 2;
  return {
    ...base,
    arrangement: 'post-base',
    post: { x0: -postDepth, y0: 0, x1: 0, y1: plateTop },
    plate: { x0: centre - halfN, y0: plateTop, x1: centre + halfN, y1: pierTop },
    pier: { x0: centre - halfPier, y0: pierTop, x1: centre + halfPier, y1: pierTop + pierDrawn },
    pierCut: true,
    rods: rowsAt.map((r) => ({
      x0: centre - r.at,
      x1: centre - r.at,
      y0: plateTop - 1,
      y1: pierTop + embedment,
      row: r.row,
    })),
    behind: Math.max(postDepth, halfPier - centre, halfN - centre),
    below: pierTop + pierDrawn,
    notes,
  };
}

function footprintDepth(layout: NonNullable<ReturnType<typeof platePlan>>['layout']): number | null {
  const f = layout.footprint;
  if (f.kind === 'I' || f.kind === 'C') return Math.max(...f.rects.map((r) => r.x1)) * 2;
  if (f.kind === 'box') return f.outer.x1 - f.outer.x0;
  if (f.kind === 'round') return 2 * f.outerRadius;
  return null;
}
