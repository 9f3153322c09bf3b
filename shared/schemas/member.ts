/** The member part of the design document (key names fixed by the engine contract). */
import { z } from 'zod';
import { lengthQ, stressQ, quantityString } from './quantity';

export const LOAD_CASES = ['D', 'L', 'Lr', 'S'] as const;
export const loadCaseSchema = z.enum(LOAD_CASES, { error: 'must be one of D, L, Lr, S' });
export type LoadCase = z.infer<typeof loadCaseSchema>;

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
});

export const loadsSchema = z.object({
  selfWeight: z.boolean().default(true),
  area: z
    .array(z.object({ case: loadCaseSchema, value: quantityString('areaLoad', 'nonNegative') }))
    .max(20)
    .default([]),
  line: z
    .array(z.object({ case: loadCaseSchema, value: quantityString('lineLoad', 'nonNegative') }))
    .max(20)
    .default([]),
  point: z
    .array(
      z.object({
        case: loadCaseSchema,
        value: quantityString('force', 'nonNegative'),
        at: lengthQ('nonNegative'),
      }),
    )
    .max(20)
    .default([]),
});

export type MemberInput = z.infer<typeof memberSchema>;
export type LoadsInput = z.infer<typeof loadsSchema>;
