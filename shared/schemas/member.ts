/** The member part of the design document (key names fixed by the engine contract). */
import { z } from 'zod';
import { parseQuantity, type Dimension } from '../engine/units';
import { lengthQ, stressQ, quantityString } from './quantity';

/** Load cases: dead, live, roof live, snow and wind (W, the only one that may be negative: upward). */
export const LOAD_CASES = ['D', 'L', 'Lr', 'S', 'W'] as const;
export const loadCaseSchema = z.enum(LOAD_CASES, { error: 'must be one of D, L, Lr, S, W' });
export type LoadCase = z.infer<typeof loadCaseSchema>;

/**
 * A load entry's value may be negative for wind only (negative lifts the tip); the error names the
 * value field (loads.area[0].value).
 */
function windOnlyNegative(dimension: Dimension) {
  return (entry: { case: LoadCase; value: string }, ctx: z.RefinementCtx) => {
    if (entry.case === 'W') return;
    const parsed = parseQuantity(entry.value, dimension);
    if (parsed.ok && parsed.value < 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['value'],
        message: `must not be negative for case ${entry.case}, got "${entry.value}" (only wind, case W, may be negative: upward)`,
      });
    }
  };
}

/** Seismic data for ASCE 7-16 12.4.2.2 (Ev = 0.2 SDS D) and 12.4.4 (net upward 0.2 D in SDC D-F). */
export const seismicSchema = z.object({
  SDS: z
    .number({ error: 'must be a number (the design spectral acceleration SDS, in g)' })
    .min(0, 'must not be negative')
    .max(3, 'must be at most 3 (g)'),
  category: z.enum(['A', 'B', 'C', 'D', 'E', 'F'], { error: 'must be a seismic design category A to F' }),
});

/** Lateral support of the member (engine contract, Version 2 keys); defaults in the engine. */
export const lateralSupportSchema = z.object({
  topFlange: z.enum(['braced', 'free'], { error: 'must be "braced" or "free"' }).optional(),
  loadAt: z
    .enum(['top-flange', 'shear-centre'], { error: 'must be "top-flange" or "shear-centre"' })
    .optional(),
  root: z.enum(['fixed', 'twist-only'], { error: 'must be "fixed" or "twist-only"' }).optional(),
  tip: z.enum(['free', 'braced'], { error: 'must be "free" or "braced"' }).optional(),
  braces: z.array(lengthQ()).max(20, 'at most 20 braces').optional(),
  effectiveLengthFactor: z
    .number({ error: 'must be a number' })
    .min(0.5, 'must be at least 0.5')
    .max(10, 'must be at most 10')
    .optional(),
});

export const platesSchema = z.object({
  rootDepth: lengthQ(),
  tipDepth: lengthQ(),
  flangeWidth: lengthQ(),
  flangeThickness: lengthQ(),
  webThickness: lengthQ(),
});

export const sectionSchema = z
  .object({
    shape: z.string().trim().min(1, 'must name a shape, e.g. "W12X26"').max(40).optional(),
    tipDepth: lengthQ().optional(),
    plates: platesSchema.optional(),
  })
  .superRefine((s, ctx) => {
    if (s.shape && s.plates) {
      ctx.addIssue({ code: 'custom', message: 'give either a catalog shape or plates, not both' });
    }
    if (!s.shape && !s.plates) {
      ctx.addIssue({
        code: 'custom',
        message: 'needs a catalog shape ("W12X26") or plates for a built-up I',
      });
    }
    if (s.tipDepth && !s.shape) {
      ctx.addIssue({ code: 'custom', path: ['tipDepth'], message: 'applies to a catalog W shape only' });
    }
  });

export const memberSchema = z.object({
  length: lengthQ(),
  spacing: lengthQ(),
  section: sectionSchema,
  steel: z.object({ Fy: stressQ().optional(), E: stressQ().optional() }).optional(),
  unbracedLength: lengthQ().optional(),
  lateralSupport: lateralSupportSchema.optional(),
});

export const loadsSchema = z.object({
  selfWeight: z.boolean().default(true),
  area: z
    .array(
      z
        .object({ case: loadCaseSchema, value: quantityString('areaLoad', 'any') })
        .superRefine(windOnlyNegative('areaLoad')),
    )
    .max(20)
    .default([]),
  line: z
    .array(
      z
        .object({ case: loadCaseSchema, value: quantityString('lineLoad', 'any') })
        .superRefine(windOnlyNegative('lineLoad')),
    )
    .max(20)
    .default([]),
  point: z
    .array(
      z
        .object({ case: loadCaseSchema, value: quantityString('force', 'any'), at: lengthQ('nonNegative') })
        .superRefine(windOnlyNegative('force')),
    )
    .max(20)
    .default([]),
  seismic: seismicSchema.optional(),
});

export type MemberInput = z.infer<typeof memberSchema>;
export type LoadsInput = z.infer<typeof loadsSchema>;
