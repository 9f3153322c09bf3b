/** Rewriting a quantity string in another unit without changing the physical value beyond display precision. */
import { convert, DIMENSIONS, parseQuantity, type Dimension } from '../../../../shared/engine/units';

/**
 * Significant digits kept when a value is rewritten in another unit: 4, as the trade reads inputs
 * (2.743 m, 344.7 MPa), a relative change of at most 5e-4, inside the 0.1 % within which
 * shared/schemas/diff.ts counts two quantities as the same input.
 */
export const SIGNIFICANT_DIGITS = 4;

export function roundSignificant(value: number, digits = SIGNIFICANT_DIGITS): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(digits));
}

/** Formats a number without exponent notation for ordinary sizes (0.0001 … 1e9). */
export function plainNumber(value: number): string {
  const rounded = roundSignificant(value);
  if (Math.abs(rounded) >= 1e-4 && Math.abs(rounded) < 1e9) {
    return rounded.toLocaleString('en-US', { useGrouping: false, maximumFractionDigits: 10 });
  }
  return String(rounded);
}

/** The unit written in a quantity string: "10 ft" → "ft", "1-1/2 in" → "in", "40 lbf/ft" → "lbf/ft". */
export function unitOfText(text: string): string {
  const match = /^[\s\d.+\-/()eE]*?(?:\d|\))\s*([A-Za-z].*)$/.exec(text.trim());
  return match ? match[1].replace(/\s+/g, ' ').trim() : '';
}

/**
 * The same physical quantity written in `unit`, or null when the text does not parse as `dimension`
 * (the field then keeps what was typed, and its error says why).
 */
export function rewriteQuantity(text: string, dimension: Dimension, unit: string): string | null {
  const parsed = parseQuantity(text, dimension);
  if (!parsed.ok) return null;
  const value = convert(parsed.value, DIMENSIONS[dimension], unit);
  return `${plainNumber(value)} ${unit}`;
}
