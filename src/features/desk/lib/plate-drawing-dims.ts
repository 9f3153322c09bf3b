/**
 * Chains of dimensions along one screen axis: extension lines from the features, a dimension line
 * with arrowheads between consecutive stations, each value written beside its line. Labels that
 * would collide slide along the line (with a leader back to their segment) and never leave the view.
 */
import type { UnitSystem } from '../../../../shared/engine/units';
import { FONT, lengthText, textWidth } from './plate-drawing-format';
import type { Box, Dimension, Label, Pt, Tone } from './plate-drawing-types';

export type StationTag = 'plate' | 'pier' | 'rod' | 'centre' | 'surface' | 'head' | 'bottom' | 'top';

export interface Station {
  /** Screen coordinate along the chain's axis. */
  at: number;
  /** Position in inches along the measured direction (segment values are differences of these). */
  value: number;
  tag: StationTag;
  /** Screen coordinate across the axis where the extension line starts (the feature's edge). */
  feature: number;
}

export interface Segment {
  id: string;
  what: string;
  tone?: Tone;
  /** Replaces the length as the label ("3 @ 4 in = 12 in"). */
  text?: string;
  minimum?: number;
  problem?: string;
}

export interface ChainSpec {
  axis: 'x' | 'y';
  /** Coordinate of the dimension line across the axis. */
  line: number;
  /** Labels on the side of smaller (-1) or larger (+1) cross coordinates. */
  side: -1 | 1;
  stations: Station[];
  units: UnitSystem;
  /** Names each segment between consecutive stations; null draws no dimension there. */
  describe: (a: Station, b: Station) => Segment | null;
  /** Labels stay inside [min, max] along the axis. */
  bounds: [number, number];
}

/** Least clear space between two labels of a chain, and between a feature and its extension line. */
const GAP = 3;
const LABEL_GAP = 10;
const ASCENT = 0.78 * FONT;

function labelAt(spec: ChainSpec, centre: number, text: string, tone: Tone): Label {
  const w = textWidth(text);
  if (spec.axis === 'x') {
    const y = spec.side < 0 ? spec.line - 4 : spec.line + 4 + ASCENT;
    const box: Box = { x0: centre - w / 2, y0: y - ASCENT, x1: centre + w / 2, y1: y + 0.22 * FONT };
    return { text, x: centre, y, anchor: 'middle', vertical: false, tone, box };
  }
  // Rotated -90 degrees: the glyphs sit on the screen-left of the baseline.
  const x = spec.side < 0 ? spec.line - 4 : spec.line + 4 + ASCENT;
  const box: Box = { x0: x - ASCENT, y0: centre - w / 2, x1: x + 0.22 * FONT, y1: centre + w / 2 };
  return { text, x, y: centre, anchor: 'middle', vertical: true, tone, box };
}

/** Slides labels along the axis so that none overlaps the next; keeps them within the bounds. */
function spread(centres: number[], widths: number[], bounds: [number, number]): number[] {
  const order = centres.map((_, i) => i).sort((a, b) => centres[a] - centres[b]);
  const start = new Array<number>(centres.length);
  let end = bounds[0] - LABEL_GAP;
  for (const i of order) {
    start[i] = Math.max(centres[i] - widths[i] / 2, end + LABEL_GAP);
    end = start[i] + widths[i];
  }
  let limit = bounds[1] + LABEL_GAP;
  for (const i of [...order].reverse()) {
    start[i] = Math.min(start[i], limit - LABEL_GAP - widths[i]);
    limit = start[i];
  }
  return start.map((s, i) => s + widths[i] / 2);
}

export function chain(spec: ChainSpec): Dimension[] {
  const st = [...spec.stations].sort((a, b) => a.at - b.at);
  const pt = (along: number, across: number): Pt =>
    spec.axis === 'x' ? { x: along, y: across } : { x: across, y: along };
  const ext = (s: Station): [Pt, Pt] => {
    const dir = Math.sign(spec.line - s.feature) || 1;
    return [pt(s.at, s.feature + dir * GAP), pt(s.at, spec.line + dir * 5)];
  };
  const parts: { a: Station; b: Station; seg: Segment; text: string; tone: Tone }[] = [];
  for (let i = 0; i + 1 < st.length; i++) {
    const [a, b] = [st[i], st[i + 1]];
    if (Math.abs(b.at - a.at) < 1e-6) continue;
    const seg = spec.describe(a, b);
    if (!seg) continue;
    const inches = Math.abs(b.value - a.value);
    parts.push({
      a,
      b,
      seg,
      text: seg.text ?? lengthText(inches, spec.units),
      tone: seg.tone ?? 'ink',
    });
  }
  const want = parts.map((p) => (p.a.at + p.b.at) / 2);
  const placed = spread(
    want,
    parts.map((p) => textWidth(p.text)),
    spec.bounds,
  );
  return parts.map((p, i) => {
    const label = labelAt(spec, placed[i], p.text, p.tone);
    const moved = Math.abs(placed[i] - want[i]) > 1;
    const off = spec.side * (spec.axis === 'x' ? 4 : 4);
    const leader: [Pt, Pt] | null = moved ? [pt(want[i], spec.line), pt(placed[i], spec.line + off)] : null;
    const dim: Dimension = {
      id: p.seg.id,
      what: p.seg.what,
      inches: Math.abs(p.b.value - p.a.value),
      text: p.text,
      tone: p.tone,
      line: [pt(p.a.at, spec.line), pt(p.b.at, spec.line)],
      ext: [ext(p.a), ext(p.b)],
      label,
      leader,
    };
    if (p.seg.minimum !== undefined) dim.minimum = p.seg.minimum;
    if (p.seg.problem) dim.problem = p.seg.problem;
    return dim;
  });
}
