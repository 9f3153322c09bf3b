/**
 * The map's colours, from the utilisation scale of the palette (tailwind.config.ts): calm below
 * 0.6, steady to 0.9, near to 1.0, over above; lighter toward the low end of each band. Colour is
 * never alone: failing points are hatched, invalid ones cross-hatched, and the readout and the
 * table give the numbers and words.
 */
import type { CellOutcome } from '../../../../shared/study/evaluate-cell';
import { CHECK_WORDS } from '../../../../shared/words/check-words';

const BANDS: { upTo: number; from: number; colour: string }[] = [
  { upTo: 0.6, from: 0, colour: '#5b8a72' },
  { upTo: 0.9, from: 0.6, colour: '#8a9a4b' },
  { upTo: 1.0, from: 0.9, colour: '#c99a2e' },
  { upTo: Infinity, from: 1.0, colour: '#b3261e' },
];

export const PENDING = '#eeece8';
export const INVALID = '#c3bdb3';

function mix(hex: string, white: number): string {
  const n = parseInt(hex.slice(1), 16);
  const ch = (v: number) => Math.round(v + (255 - v) * white);
  const r = ch((n >> 16) & 255);
  const g = ch((n >> 8) & 255);
  const b = ch(n & 255);
  return `rgb(${r}, ${g}, ${b})`;
}

/** The fill of one point by its governing utilisation. */
export function cellFill(o: CellOutcome | undefined): string {
  if (!o) return PENDING;
  if (o.kind === 'invalid') return INVALID;
  const r = o.governing.ratio;
  if (r === null) return mix('#b3261e', 0);
  const band = BANDS.find((b) => r <= b.upTo) ?? BANDS[3];
  const span = Number.isFinite(band.upTo) ? band.upTo - band.from : 0.5;
  const t = Math.min(Math.max((r - band.from) / span, 0), 1);
  return mix(band.colour, 0.45 * (1 - t));
}

/** The bands in the product's words (shared/words/check-words.ts); the ratio ranges tell the bands apart. */
export const LEGEND = [
  { label: `${CHECK_WORDS.pass} (ratio < 0.6)`, colour: '#5b8a72' },
  { label: `${CHECK_WORDS.pass} (ratio 0.6-0.9)`, colour: '#8a9a4b' },
  { label: `${CHECK_WORDS.near} (0.9-1.0)`, colour: '#c99a2e' },
  { label: `${CHECK_WORDS.fail} (> 1.0), hatched`, colour: '#b3261e' },
];
