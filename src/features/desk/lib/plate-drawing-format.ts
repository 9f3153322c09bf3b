/**
 * How the shop sketch writes a length: US in inches and sixteenths as the trade reads a tape
 * (1-5/16 in), SI in millimetres (whole mm from 100 mm, tenths below). A US length that is not on
 * the 1/16 in grid is marked "≈" so a rounded figure is never read as exact.
 */
import { inchFraction } from '../../../../shared/engine/connection/inch-fraction';
import { convert, type UnitSystem } from '../../../../shared/engine/units';

export function lengthText(inches: number, units: UnitSystem): string {
  if (!Number.isFinite(inches)) return '—';
  if (units === 'SI') {
    const mm = convert(inches, 'in', 'mm');
    const rounded = Math.abs(mm) >= 100 ? Math.round(mm) : Math.round(mm * 10) / 10;
    return `${rounded} mm`;
  }
  const onGrid = Math.abs(inches * 16 - Math.round(inches * 16)) < 1e-6;
  return `${onGrid ? '' : '≈'}${inchFraction(inches)} in`;
}

/** A square plate washer: side x side x thickness. */
export function washerText(size: number, thickness: number, units: UnitSystem): string {
  const unit = units === 'SI' ? ' mm' : ' in';
  const bare = (v: number) => lengthText(v, units).replace(unit, '');
  return `${bare(size)} x ${bare(size)} x ${lengthText(thickness, units)}`;
}

/** Label font size in drawing units; the panel shows the drawing at about 1:1 at 1440 px wide. */
export const FONT = 14;

/**
 * Estimated advance of a label in drawing units (IBM Plex Mono: 0.6 em per character), used to
 * keep labels apart and off the plate; the browser test measures the real boxes.
 */
export function textWidth(text: string, size = FONT): number {
  return [...text].length * 0.6 * size;
}
