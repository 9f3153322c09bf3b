/**
 * Shear, moment and deflection along the member as vector drawings. Shear and moment: every
 * combination of the design method, the one with the largest root value drawn heavy and its
 * maximum marked. Deflection: the unfactored load cases (the member's own bending), with the
 * governing service values of the deflection checks written under the drawing.
 */
import type { DesignResult, StationSeries } from '../../../shared/engine/types';
import { formatQuantity } from '../../../shared/engine/units';
import { CONTENT_WIDTH, INK, MUTED, PAGE, RULE, type PdfWriter } from './pdf-writer';

type Key = 'V' | 'M' | 'deflection';

interface Peak {
  series: StationSeries;
  index: number;
  value: number;
}

function peakOf(series: readonly StationSeries[], key: Key): Peak | null {
  let best: Peak | null = null;
  for (const s of series)
    s[key].forEach((v, index) => {
      if (!best || Math.abs(v) > Math.abs(best.value)) best = { series: s, index, value: v };
    });
  return best;
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(3)));
}

function chart(
  w: PdfWriter,
  title: string,
  x: readonly number[],
  series: readonly StationSeries[],
  key: Key,
  units: { x: string; y: string },
  downward: boolean,
): Peak | null {
  const doc = w.doc;
  const height = 120;
  w.ensure(height + 60);
  w.text(title, { bold: true, size: 10 }, PAGE.left);
  const top = doc.y + 4;
  const left = PAGE.left + 62;
  const width = CONTENT_WIDTH - 70;
  const peak = peakOf(series, key);
  const max = Math.max(1e-12, ...series.flatMap((s) => s[key].map((v) => Math.abs(v))));
  const L = x[x.length - 1] || 1;
  const px = (xi: number) => left + (xi / L) * width;
  // Downward quantities hang below the axis, as the member moves.
  const zeroY = downward ? top + 8 : top + height - 8;
  const py = (v: number) =>
    downward ? zeroY + (v / max) * (height - 16) : zeroY - (v / max) * (height - 16);
  doc.rect(left, top, width, height).lineWidth(0.4).strokeColor(RULE).stroke();
  doc
    .moveTo(left, zeroY)
    .lineTo(left + width, zeroY)
    .lineWidth(0.6)
    .strokeColor(MUTED)
    .stroke();
  for (const s of series) {
    const heavy = peak?.series === s;
    s[key].forEach((v, i) => (i === 0 ? doc.moveTo(px(x[i]), py(v)) : doc.lineTo(px(x[i]), py(v))));
    doc
      .lineWidth(heavy ? 1.6 : 0.6)
      .strokeColor(heavy ? INK : '#8c959f')
      .stroke();
  }
  for (const t of [0, 0.25, 0.5, 0.75, 1]) {
    const xv = t * L;
    doc
      .moveTo(px(xv), top + height)
      .lineTo(px(xv), top + height + 3)
      .lineWidth(0.4)
      .strokeColor(MUTED)
      .stroke();
    w.text(fmt(xv), { size: 7, color: MUTED, width: 40, align: 'center' }, px(xv) - 20, top + height + 4);
  }
  w.text(
    `x (${units.x}) from the root`,
    { size: 7, color: MUTED, width: 120, align: 'right' },
    left + width - 120,
    top + height + 13,
  );
  w.text(
    `${fmt(max)} ${units.y}`,
    { size: 7, color: MUTED, width: 58, align: 'right' },
    PAGE.left,
    downward ? top + height - 12 : top + 4,
  );
  w.text('0', { size: 7, color: MUTED, width: 58, align: 'right' }, PAGE.left, zeroY - 4);
  if (peak) {
    const cx = px(x[peak.index]);
    const cy = py(peak.value);
    doc.circle(cx, cy, 2.6).fillColor('#b42318').fill();
    const label = `max ${fmt(Math.abs(peak.value))} ${units.y} at x = ${fmt(x[peak.index])} ${units.x} (${peak.series.name})`;
    // The label goes in the corner across from the peak, where the curves are near zero.
    const lx = cx < left + width / 2 ? left + width - 304 : left + 4;
    const ly = downward ? top + height - 14 : top + 4;
    w.text(label, { size: 7.5, width: 300 }, lx, ly);
  }
  doc.fillColor(INK);
  doc.x = PAGE.left;
  doc.y = top + height + 26;
  return peak;
}

export function drawDiagrams(w: PdfWriter, result: DesignResult): void {
  const st = result.stations;
  if (!st || st.x.length < 2) {
    w.para('The station arrays were not stored with this revision, so the diagrams cannot be drawn from it.');
    return;
  }
  const u = st.units;
  const combos = st.combinations;
  const m = chart(
    w,
    `Bending moment M(x), ${result.method} combinations`,
    st.x,
    combos,
    'M',
    { x: u.x, y: u.M },
    false,
  );
  const v = chart(
    w,
    `Shear V(x), ${result.method} combinations`,
    st.x,
    combos,
    'V',
    { x: u.x, y: u.V },
    false,
  );
  chart(
    w,
    'Deflection along the member by load case (unfactored, rigid root)',
    st.x,
    st.cases,
    'deflection',
    { x: u.x, y: u.deflection },
    true,
  );
  const lines: string[] = [];
  if (m)
    lines.push(
      `Governing moment: ${fmt(m.value)} ${u.M} at x = ${fmt(st.x[m.index])} ${u.x} under ${m.series.name}.`,
    );
  if (v)
    lines.push(
      `Governing shear: ${fmt(v.value)} ${u.V} at x = ${fmt(st.x[v.index])} ${u.x} under ${v.series.name}.`,
    );
  for (const id of ['member.deflection.live', 'member.deflection.total']) {
    const c = result.checks.find((k) => k.id === id);
    if (c?.demand)
      lines.push(
        `${c.title}: ${formatQuantity(c.demand)}${c.combination ? ` under ${c.combination}` : ''}${c.capacity ? `, limit ${formatQuantity(c.capacity)}` : ''} (service combination, includes the root's rotation where the design says so).`,
      );
  }
  for (const line of lines) w.para(line, { size: 9 });
}
