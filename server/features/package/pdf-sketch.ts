/**
 * The plate on the pier in plan, and the rod's embedment in section, drawn to a stated scale from
 * the engine's plate layout (inches), with the dimensions a fabricator sets out from.
 */
import type { PlateLayout, Rect } from '../../../shared/engine/connection/plate-layout';
import { inchFraction } from '../../../shared/engine/connection/inch-fraction';
import { toInternal } from '../../../shared/engine/units';
import type { DesignInput } from '../../../shared/schemas/design';
import { CONTENT_WIDTH, INK, MUTED, PAGE, type PdfWriter } from './pdf-writer';

/** Printed scales, 1:n at 72 points to the inch; the largest that fits is used. */
const SCALES = [2, 3, 4, 5, 6, 8, 10, 12, 16, 20, 24, 32, 48];

function pickScale(spanIn: number, room: number): number {
  return SCALES.find((n) => (spanIn * 72) / n <= room) ?? SCALES[SCALES.length - 1];
}

const inch = (v: number) => `${inchFraction(v)} in`;

function dim(
  w: PdfWriter,
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  label: string,
  side: 'above' | 'left',
): void {
  const doc = w.doc;
  doc.moveTo(x0, y0).lineTo(x1, y1).lineWidth(0.5).strokeColor(MUTED).stroke();
  for (const [x, y] of [
    [x0, y0],
    [x1, y1],
  ])
    doc.circle(x, y, 1.2).fillColor(MUTED).fill();
  if (side === 'above')
    w.text(
      label,
      { size: 7, color: INK, width: 90, align: 'center' },
      (x0 + x1) / 2 - 45,
      Math.min(y0, y1) - 10,
    );
  else
    w.text(
      label,
      { size: 7, color: INK, width: 60, align: 'right' },
      Math.min(x0, x1) - 64,
      (y0 + y1) / 2 - 4,
    );
}

export function drawPlateSketch(w: PdfWriter, input: DesignInput, layout: PlateLayout): void {
  const doc = w.doc;
  const span = Math.max(layout.pier.length, layout.plate.N);
  const spanB = Math.max(layout.pier.width, layout.plate.B);
  const n = pickScale(Math.max(span, spanB * 1.2), CONTENT_WIDTH - 150);
  const s = 72 / n;
  const planH = spanB * s + 40;
  w.ensure(planH + 40);
  w.text(
    `Plan at the top of the pier, scale 1:${n} on a Letter page printed at 100 %`,
    { bold: true, size: 10 },
    PAGE.left,
  );
  const cx = PAGE.left + 90 + (span * s) / 2;
  const cy = doc.y + 24 + (spanB * s) / 2;
  // Plate x (along N) runs across the page, y (along B) down the page.
  const X = (x: number) => cx + x * s;
  const Y = (y: number) => cy + y * s;
  const rect = (r: Rect) => doc.rect(X(r.x0), Y(r.y0), (r.x1 - r.x0) * s, (r.y1 - r.y0) * s);
  rect(layout.pier).fillColor('#eef1f4').fill();
  rect(layout.pier).lineWidth(0.6).strokeColor(MUTED).stroke();
  rect(layout.plate).fillColor('#d8dee4').fill();
  rect(layout.plate).lineWidth(1).strokeColor(INK).stroke();
  const fp = layout.footprint;
  if (fp.kind === 'I' || fp.kind === 'C') for (const r of fp.rects) rect(r).fillColor('#57606a').fill();
  else if (fp.kind === 'box') {
    rect(fp.outer).fillColor('#57606a').fill();
    rect(fp.inner).fillColor('#d8dee4').fill();
  } else if (fp.kind === 'round') {
    doc
      .circle(X(0), Y(0), fp.outerRadius * s)
      .fillColor('#57606a')
      .fill();
    doc
      .circle(X(0), Y(0), fp.innerRadius * s)
      .fillColor('#d8dee4')
      .fill();
  }
  for (const rod of layout.rods) {
    if (layout.washer) {
      const h = layout.washer.size / 2;
      doc
        .rect(X(rod.x - h), Y(rod.y - h), 2 * h * s, 2 * h * s)
        .lineWidth(0.5)
        .strokeColor(INK)
        .stroke();
    }
    if (layout.holeDiameter)
      doc
        .circle(X(rod.x), Y(rod.y), (layout.holeDiameter / 2) * s)
        .lineWidth(0.5)
        .dash(1.5, { space: 1.5 })
        .strokeColor(INK)
        .stroke()
        .undash();
    doc
      .circle(X(rod.x), Y(rod.y), (layout.rodDiameter / 2) * s)
      .fillColor(INK)
      .fill();
  }
  const top = Y(layout.pier.y0) - 12;
  dim(w, X(layout.plate.x0), top, X(layout.plate.x1), top, `N = ${inch(layout.plate.N)}`, 'above');
  const bottom = Y(layout.pier.y1) + 14;
  dim(w, X(layout.pier.x0), bottom, X(layout.pier.x1), bottom, `pier ${inch(layout.pier.length)}`, 'above');
  const leftX = X(layout.pier.x0) - 10;
  dim(w, leftX, Y(layout.plate.y0), leftX, Y(layout.plate.y1), `B = ${inch(layout.plate.B)}`, 'left');
  dim(
    w,
    leftX - 64,
    Y(layout.pier.y0),
    leftX - 64,
    Y(layout.pier.y1),
    `pier ${inch(layout.pier.width)}`,
    'left',
  );
  const tension = layout.rods.filter((r) => r.row === 'tension');
  if (tension.length) {
    const r0 = tension[0];
    const yb = Y(layout.plate.y1) + 4;
    dim(w, X(0), yb, X(r0.x), yb, `f = ${inch(r0.x)}`, 'above');
    if (tension.length > 1) {
      const xs = X(r0.x) + 14;
      dim(w, xs, Y(tension[0].y), xs, Y(tension[1].y), '', 'left');
      w.text(
        `gauge ${inch(Math.abs(tension[1].y - tension[0].y))}`,
        { size: 7, width: 80 },
        xs + 3,
        (Y(tension[0].y) + Y(tension[1].y)) / 2 - 4,
      );
    }
  }
  doc.fillColor(INK);
  doc.x = PAGE.left;
  doc.y = bottom + 12;
  const e = layout.edgeDistances;
  const a = input.connection?.anchors;
  const hef = a ? toInternal(a.embedment, 'length') : null;
  w.table(
    [
      ['Dimension', 'Value', 'Dimension', 'Value'],
      [
        'Plate N x B x t',
        `${inch(layout.plate.N)} x ${inch(layout.plate.B)} x ${inch(layout.plate.thickness)}`,
        'Pier length x width',
        `${inch(layout.pier.length)} x ${inch(layout.pier.width)}`,
      ],
      [
        'Rods',
        `${layout.rods.length} x ${inch(layout.rodDiameter)} dia`,
        'Embedment hef',
        hef === null ? '' : inch(hef),
      ],
      [
        'Hole diameter',
        layout.holeDiameter ? inch(layout.holeDiameter) : 'not tabulated',
        'Plate washer',
        layout.washer
          ? `${inch(layout.washer.size)} square x ${inch(layout.washer.thickness)}`
          : 'not tabulated',
      ],
      [
        'Rod to plate edge along N',
        inch(e.rodToPlateAlongN),
        'Rod to plate edge along B',
        inch(e.rodToPlateAlongB),
      ],
      [
        'Rod to pier edge along N',
        inch(e.rodToPierAlongN),
        'Rod to pier edge along B',
        inch(e.rodToPierAlongB),
      ],
      [
        'Least rod edge distance accepted',
        e.minimumToPlate === null ? 'not tabulated' : inch(e.minimumToPlate),
        'Section on the plate',
        layout.footprint.label,
      ],
    ],
    [130, 122, 130, 122],
    { header: true },
  );
  if (hef !== null) drawEmbedment(w, layout, hef);
}

/** The rod in section through the pier: plate thickness on top, embedment hef to the head. */
function drawEmbedment(w: PdfWriter, layout: PlateLayout, hef: number): void {
  const doc = w.doc;
  const depth = hef + 6;
  const n = pickScale(Math.max(depth, layout.pier.length), 300);
  const s = 72 / n;
  w.ensure(depth * s + 50);
  w.text(`Section through the tension row, scale 1:${n}`, { bold: true, size: 10 }, PAGE.left);
  const x0 = PAGE.left + 120;
  const yTop = doc.y + 16;
  const pierW = layout.pier.length * s;
  doc
    .rect(x0, yTop, pierW, depth * s)
    .fillColor('#eef1f4')
    .fill();
  doc
    .rect(x0, yTop, pierW, depth * s)
    .lineWidth(0.6)
    .strokeColor(MUTED)
    .stroke();
  const plateX = x0 + (layout.plate.x0 - layout.pier.x0) * s;
  doc
    .rect(plateX, yTop - layout.plate.thickness * s, layout.plate.N * s, layout.plate.thickness * s)
    .fillColor('#8c959f')
    .fill();
  for (const rod of layout.rods.filter((r, i, all) => all.findIndex((q) => q.x === r.x) === i)) {
    const rx = x0 + (rod.x - layout.pier.x0) * s;
    doc
      .rect(
        rx - (layout.rodDiameter / 2) * s,
        yTop - layout.plate.thickness * s - 4,
        layout.rodDiameter * s,
        (hef + layout.plate.thickness) * s + 4,
      )
      .fillColor(INK)
      .fill();
    doc
      .rect(
        rx - layout.rodDiameter * s,
        yTop + hef * s,
        2 * layout.rodDiameter * s,
        Math.max(2, 0.5 * layout.rodDiameter * s),
      )
      .fillColor(INK)
      .fill();
  }
  const dx = x0 - 12;
  dim(w, dx, yTop, dx, yTop + hef * s, `hef = ${inch(hef)}`, 'left');
  doc.x = PAGE.left;
  doc.y = yTop + depth * s + 14;
}
