/**
 * zod building blocks for quantity strings ("10 ft", "60 psf"). Each one checks that the string
 * parses with a unit of the right dimension and, where asked, that the value is positive.
 */
import { z } from 'zod';
import { parseQuantity, dimensionWord, quoted, type Dimension } from '../engine/units';

export type Sign = 'any' | 'positive' | 'nonNegative';

export function quantityString(dimension: Dimension, sign: Sign = 'positive') {
  return z
    .string({ error: `must be ${dimensionWord(dimension)} written with a unit, e.g. "10 ft"` })
    .max(64, 'is too long for a quantity')
    .superRefine((text, ctx) => {
      const parsed = parseQuantity(text, dimension);
      if (!parsed.ok) {
        ctx.addIssue({ code: 'custom', message: parsed.message });
        return;
      }
      if (sign === 'positive' && !(parsed.value > 0)) {
        ctx.addIssue({
          code: 'custom',
          message: `must be a positive ${noun(dimension)}, got ${quoted(text)}`,
        });
      }
      if (sign === 'nonNegative' && parsed.value < 0) {
        ctx.addIssue({ code: 'custom', message: `must not be negative, got ${quoted(text)}` });
      }
    });
}

function noun(dimension: Dimension): string {
  return dimensionWord(dimension).replace(/^an? /, '');
}

export const lengthQ = (sign: Sign = 'positive') => quantityString('length', sign);
export const stressQ = (sign: Sign = 'positive') => quantityString('stress', sign);

/** Formats a zod issue path the way every error in Reachline names a field: loads.area[0].value */
export function formatPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out ? `.${String(part)}` : String(part);
  }
  return out || '(document)';
}

export interface FieldIssue {
  path: string;
  message: string;
}

/** Turns a zod error into the field issues used by the API error shape and the CLI. */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: formatPath(issue.path), message: issue.message }));
}
