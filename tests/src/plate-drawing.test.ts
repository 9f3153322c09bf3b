/**
 * The shop sketch's drawing model: every dimension it writes is the engine's own geometry
 * (plateLayout / readGeometry), rods off the pier or too near an edge are marked with words, the
 * face plate gets its own elevation, and no label sits on the plate.
 */
import { describe, expect, it } from 'vitest';
import { readGeometry } from '../../shared/engine/connection/connection-geometry';
import { plateLayout } from '../../shared/engine/connection/plate-layout';
import { rootOutline } from '../../shared/engine/connection/root-outline';
import { evaluateDesign } from '../../shared/engine/design';
import { exampleDesign } from '../../shared/engine/examples';
import { findShape } from '../../shared/engine/shapes/table';
import type { DesignResult } from '../../shared/engine/types';
import { parseDesign, parsedConnectionSchema } from '../../shared/schemas/parsed-design';
import { designSchema, type DesignDocument } from '../../shared/schemas/design';
import { plateDrawing, type PlateDrawing } from '../../src/features/desk/lib/plate-drawing';
import { lengthText } from '../../src/features/desk/lib/plate-drawing-format';
import { boxesOverlap, type DrawingView } from '../../src/features/desk/lib/plate-drawing-types';

type Conn = NonNullable<DesignDocument['connection']>;
type Doc = ReturnType<typeof designSchema.parse>;
function withConnection(change: (c: Conn) => Conn, units: 'US' | 'SI' = 'US'): Doc {
  return designSchema.parse({ ...exampleDesign, units, connection: change(exampleDesign.connection!) });
}
function draw(doc: Doc): { d: PlateDrawing; result: DesignResult } {
  const result = evaluateDesign(parseDesign(doc), {});
  const d = plateDrawing(doc, result);
  if (!d) throw new Error('no drawing');
  return { d, result };
}
const dims = (d: PlateDrawing) => d.views.flatMap((v) => v.dims);
const dim = (d: PlateDrawing, id: string) => {
  const found = dims(d).filter((x) => x.id === id);
  if (found.length === 0) throw new Error(`no dimension ${id}`);
  return found;
};
function engineGeometry(doc: DesignDocument) {
  const input = parsedConnectionSchema.parse(doc.connection);
  const root = rootOutline(doc.member.section, findShape)!;
  return { L: plateLayout(input, root, findShape), geo: readGeometry(input, root, findShape) };
}
function labelsOf(v: DrawingView) {
  return [...v.dims.map((x) => x.label), ...v.callouts.flatMap((c) => c.labels), ...v.notes];
}

describe('plate sketch model of the example post base', () => {
  const doc = designSchema.parse(exampleDesign);
  const { d } = draw(doc);
  const { L, geo } = engineGeometry(doc);

  it('writes every dimension as the engine geometry has it, in inches and sixteenths', () => {
    const expected: Record<string, number> = {
      'plate.N': geo.N,
      'plate.B': geo.B,
      'pier.length': geo.pierLength,
      'pier.width': geo.pierWidth,
      'rod.offset.pos': geo.f,
      'rod.offset.neg': geo.f,
      'rods.rowsApart': 2 * geo.f,
      'rods.gauge': geo.g,
      'rod.plateEdge.N.pos': L.edgeDistances.rodToPlateAlongN,
      'rod.plateEdge.N.neg': L.edgeDistances.rodToPlateAlongN,
      'rod.plateEdge.B.pos': L.edgeDistances.rodToPlateAlongB,
      'rod.plateEdge.B.neg': L.edgeDistances.rodToPlateAlongB,
      'rod.pierEdge.N.pos': L.edgeDistances.rodToPierAlongN,
      'rod.pierEdge.N.neg': L.edgeDistances.rodToPierAlongN,
      'rod.pierEdge.B.pos': L.edgeDistances.rodToPierAlongB,
      'rod.pierEdge.B.neg': L.edgeDistances.rodToPierAlongB,
      'rods.embedment': geo.hef,
      'plate.thickness': geo.t,
    };
    for (const [id, inches] of Object.entries(expected)) {
      for (const x of dim(d, id)) {
        expect(x.inches, id).toBeCloseTo(inches, 9);
        expect(x.text, id).toBe(lengthText(inches, 'US'));
      }
    }
    // The example document's own figures (shared/engine/examples.ts): 18 x 14 x 1-1/4 in, f 7, g 9, pier 30 x 24.
    expect(dim(d, 'plate.N')[0].text).toBe('18 in');
    expect(dim(d, 'plate.thickness')[0].text).toBe('1-1/4 in');
    expect(dim(d, 'rod.plateEdge.B.pos')[0].text).toBe('2-1/2 in');
    expect(dim(d, 'rod.pierEdge.B.pos')[0].text).toBe('7-1/2 in');
    expect(d.problems).toEqual([]);
  });

  it('calls out rod, hole and washer from DG1 Table 2.3 for a 3/4 in rod', () => {
    const row = (id: string) => d.rows.find((r) => r.id === id)?.text;
    // AISC Design Guide 1 (2nd ed.) Table 2.3 (REFERENCES.md [pub]): 3/4 in rod, hole 1-5/16 in, washer 2 x 1/4 in.
    expect(row('rods')).toBe('4 x 3/4 in F1554-36, 2 in each row, headed, cast in');
    expect(row('holes')).toBe('1-5/16 in');
    expect(row('washers')).toBe('2 x 2 x 1/4 in');
    const callout = d.views[0].callouts.flatMap((c) => c.labels.map((l) => l.text));
    expect(callout).toEqual([
      '4 rods 3/4 in F1554-36',
      'holes 1-5/16 in (DG1 Table 2.3)',
      'plate washers 2 x 2 x 1/4 in',
      'post W8X18',
    ]);
  });

  it('marks the row the governing combination pulls as tension, the other as compression', () => {
    const roles = d.views[0].shapes.filter((s) => s.role === 'rod-tension' || s.role === 'rod-compression');
    expect(roles.filter((s) => s.role === 'rod-tension')).toHaveLength(2);
    expect(d.legend.map((l) => l.symbol)).toEqual(expect.arrayContaining(['rod-tension', 'rod-compression']));
    const up: DesignResult = {
      ...draw(doc).result,
      connection: { ...draw(doc).result.connection!, direction: 'up' },
    };
    const swapped = plateDrawing(doc, up)!;
    // Under an upward moment the row at -x (the tip side) is in tension.
    const tensionX = swapped.views[0].shapes
      .filter((s) => s.kind === 'circle' && s.role === 'rod-tension')
      .map((s) => (s.kind === 'circle' ? s.cx : NaN));
    const plate = swapped.views[0].keepClear[0];
    expect(tensionX.every((x) => x < (plate.x0 + plate.x1) / 2)).toBe(true);
  });

  it('keeps every label off the plate, apart from each other and inside the view', () => {
    const hss = withConnection((c) => ({
      ...c,
      footprint: { shape: 'HSS8X8X1/2' },
      post: { height: '12 in' },
      anchors: { ...c.anchors, perSide: 3, gauge: '4.5 in' },
      pier: { ...c.pier, depth: '20 in' },
    }));
    for (const drawing of [d, draw(hss).d]) {
      for (const v of drawing.views) {
        const labels = labelsOf(v);
        for (const l of labels) {
          for (const keep of v.keepClear) expect(boxesOverlap(l.box, keep), `${v.id} ${l.text}`).toBe(false);
          expect(l.box.x0, l.text).toBeGreaterThanOrEqual(0);
          expect(l.box.x1, l.text).toBeLessThanOrEqual(v.width);
          expect(l.box.y1, l.text).toBeLessThanOrEqual(v.height);
        }
        const dimLabels = v.dims.map((x) => x.label);
        for (let i = 0; i < dimLabels.length; i++)
          for (let j = i + 1; j < dimLabels.length; j++)
            expect(
              boxesOverlap(dimLabels[i].box, dimLabels[j].box),
              `${dimLabels[i].text} / ${dimLabels[j].text}`,
            ).toBe(false);
      }
    }
  });

  it('shows 3 rods in a row as a gauge chain, and the post height and pier depth in the section', () => {
    const doc3 = withConnection((c) => ({
      ...c,
      footprint: { shape: 'HSS8X8X1/2' },
      post: { height: '12 in' },
      anchors: { ...c.anchors, perSide: 3, gauge: '4.5 in' },
      pier: { ...c.pier, depth: '20 in' },
    }));
    const { d: d3 } = draw(doc3);
    expect(dim(d3, 'rods.gauge')[0].text).toBe('2 @ 4-1/2 in = 9 in');
    expect(dim(d3, 'post.height')[0].text).toBe('12 in');
    expect(dim(d3, 'pier.depth')[0].text).toBe('20 in');
    expect(dim(d3, 'pier.beyondHeads')[0].text).toBe('8 in');
    expect(d3.views[1].shapes.some((s) => s.role === 'grout')).toBe(true);
  });
});

describe('a 10 in pier under an 18 x 14 in plate', () => {
  const doc = withConnection((c) => ({ ...c, pier: { length: '10 in', width: '10 in' } }));
  const { d, result } = draw(doc);

  it('marks the rods off the pier in red with words and writes the real distances', () => {
    // Pier 10 in, f = 7 in: the rows lie 7 - 5 = 2 in beyond the pier edge; gauge 9 in: 5 - 4.5 = 0.5 in along B.
    for (const x of dim(d, 'rod.pierEdge.N.pos')) {
      expect(x.inches).toBeCloseTo(2, 9);
      expect(x.tone).toBe('warn');
      expect(x.problem).toBe('outside the pier (2 in beyond its edge)');
    }
    const alongB = dim(d, 'rod.pierEdge.B.pos')[0];
    expect(alongB.text).toBe('1/2 in');
    expect(alongB.problem).toBe('edge 1/2 in < 2-3/8 in min');
    expect(dim(d, 'pier.length')[0].text).toBe('10 in');
    expect(dims(d).some((x) => x.text === '8-1/2 in' || x.text === '8 in')).toBe(false);
    const rings = d.views[0].shapes.filter((s) => s.role === 'warn-ring');
    expect(rings).toHaveLength(4);
    const notes = d.views[0].notes.filter((n) => n.tone === 'warn').map((n) => n.text);
    expect(notes).toContain(
      '⚠ Rod to pier edge along N (row away from the tip): outside the pier (2 in beyond its edge)',
    );
    expect(notes).toContain('⚠ Plate N 18 in > pier 10 in: the plate overhangs the pier');
    expect(d.desc).toMatch(/Marked in red \(4 of 4 rods\)/);
  });

  it('agrees with the engine: anchors.layout and plate.geometry fail for the same reasons', () => {
    const layout = result.checks.find((c) => c.id === 'anchors.layout')!;
    expect(layout.ok).toBe(false);
    expect(layout.note).toMatch(/pier edge along N: needs 2.375 in, has -2 in/);
    expect(result.checks.find((c) => c.id === 'plate.geometry')!.ok).toBe(false);
  });

  it('takes the pier edge minimum the engine takes (2 in + da/2 = 2-3/8 in for a 3/4 in rod)', () => {
    // Pier width 11.7 in: 5.85 - 4.5 = 1.35 in along B; 13.8 in: 2.4 in, clear of 2.375 in.
    const near = draw(withConnection((c) => ({ ...c, pier: { length: '30 in', width: '13.7 in' } })));
    const clear = draw(withConnection((c) => ({ ...c, pier: { length: '30 in', width: '13.8 in' } })));
    expect(dim(near.d, 'rod.pierEdge.B.pos')[0].tone).toBe('warn');
    expect(near.result.checks.find((c) => c.id === 'anchors.layout')!.note).toMatch(/pier edge along B/);
    expect(dim(clear.d, 'rod.pierEdge.B.pos')[0].tone).toBe('ink');
    expect(clear.result.checks.find((c) => c.id === 'anchors.layout')!.note ?? '').not.toMatch(/pier edge/);
  });
});

describe('a face plate', () => {
  const doc = withConnection(
    (c) => ({ ...c, arrangement: 'face-plate', pier: { length: '30 in', width: '24 in', depth: '16 in' } }),
    'SI',
  );
  const { d } = draw(doc);

  it('is drawn as an elevation on the pier face, N up the page, and a section turned a quarter', () => {
    expect(d.arrangement).toBe('face-plate');
    expect(d.views.map((v) => v.id)).toEqual(['face', 'section']);
    const plate = d.views[0].keepClear[0];
    // N (18 in) runs up the page, B (14 in) across.
    expect((plate.y1 - plate.y0) / (plate.x1 - plate.x0)).toBeCloseTo(18 / 14, 6);
    const N = dim(d, 'plate.N')[0];
    expect(N.line[0].x).toBeCloseTo(N.line[1].x, 9);
    const hef = dim(d, 'rods.embedment')[0];
    expect(hef.line[0].y).toBeCloseTo(hef.line[1].y, 9);
    expect(d.views[1].shapes.some((s) => s.role === 'grout')).toBe(false);
    expect(d.views[0].callouts.flatMap((c) => c.labels).map((l) => l.text)).toContain('member W8X18');
  });

  it('writes millimetres: 18 in = 457 mm, hole 1-5/16 in = 33.3 mm, embedment 305 mm, depth 406 mm', () => {
    expect(dim(d, 'plate.N')[0].text).toBe('457 mm');
    expect(d.rows.find((r) => r.id === 'holes')?.text).toBe('33.3 mm');
    expect(dim(d, 'rods.embedment')[0].text).toBe('305 mm');
    expect(dim(d, 'pier.depth')[0].text).toBe('406 mm');
    expect(dim(d, 'pier.beyondHeads')[0].text).toBe('102 mm');
  });
});

describe('lengthText', () => {
  it('writes sixteenths in US units and marks a length off the grid as approximate', () => {
    expect(lengthText(1.3125, 'US')).toBe('1-5/16 in');
    expect(lengthText(8.5, 'US')).toBe('8-1/2 in');
    expect(lengthText(1.15625, 'US')).toBe('≈1-3/16 in');
    expect(lengthText(18, 'SI')).toBe('457 mm');
    expect(lengthText(0.25, 'SI')).toBe('6.4 mm');
  });
});

describe('hole and washer sizes on the sketch, against AISC Design Guide 1 (2nd ed.) Table 2.3', () => {
  // Source: AISC DG1 2nd ed. Table 2.3 as /work/shared/REFERENCES.md lists it [pub]; the same values
  // from memory of the table (no copy of it was at hand). Rod, hole, washer side x thickness, in.
  const TABLE_2_3: [string, string, string][] = [
    ['3/4 in', '1-5/16 in', '2 x 2 x 1/4 in'],
    ['7/8 in', '1-9/16 in', '2-1/2 x 2-1/2 x 5/16 in'],
    ['1 in', '1-13/16 in', '3 x 3 x 3/8 in'],
    ['1-1/4 in', '2-1/16 in', '3 x 3 x 1/2 in'],
    ['1-1/2 in', '2-5/16 in', '3-1/2 x 3-1/2 x 1/2 in'],
    ['1-3/4 in', '2-3/4 in', '4 x 4 x 5/8 in'],
    ['2 in', '3-1/4 in', '5 x 5 x 3/4 in'],
  ];
  it.each(TABLE_2_3)('a %s rod: hole %s, plate washer %s', (rod, hole, washer) => {
    const doc = withConnection((c) => ({
      ...c,
      plate: { ...c.plate, N: '30 in', B: '24 in' },
      anchors: { ...c.anchors, diameter: rod, offset: '10 in', gauge: '12 in' },
      pier: { length: '48 in', width: '40 in' },
    }));
    const d = plateDrawing(doc, null)!;
    expect(d.rows.find((r) => r.id === 'holes')?.text).toBe(hole);
    expect(d.rows.find((r) => r.id === 'washers')?.text).toBe(washer);
    expect(d.views[0].callouts[0].labels.map((l) => l.text)).toContain(`holes ${hole} (DG1 Table 2.3)`);
  });

  it('says so when the rod size is not in the table (1-1/8 in)', () => {
    const d = plateDrawing(
      withConnection((c) => ({ ...c, anchors: { ...c.anchors, diameter: '1-1/8 in' } })),
      null,
    )!;
    expect(d.rows.find((r) => r.id === 'holes')).toMatchObject({
      text: 'rod size not in the table',
      tone: 'warn',
    });
  });
});
