/** The connection part of the design document (key names fixed by the engine contract). */
import { z } from 'zod';
import { lengthQ, stressQ } from './quantity';

export const ANCHOR_GRADES = ['F1554-36', 'F1554-55', 'F1554-105'] as const;

export const connectionSchema = z.object({
  arrangement: z.enum(['post-base', 'face-plate'], { error: 'must be "post-base" or "face-plate"' }),
  footprint: z.object({ shape: z.string().trim().min(1).max(40) }).optional(),
  plate: z.object({
    N: lengthQ(),
    B: lengthQ(),
    thickness: lengthQ(),
    Fy: stressQ().default('36 ksi'),
  }),
  anchors: z.object({
    perSide: z
      .number({ error: 'must be a whole number of rods' })
      .int('must be a whole number of rods')
      .min(1, 'needs at least one rod in each row')
      .max(8, 'at most 8 rods in a row'),
    diameter: lengthQ(),
    grade: z.enum(ANCHOR_GRADES, { error: 'must be F1554-36, F1554-55 or F1554-105' }),
    offset: lengthQ(),
    gauge: lengthQ('nonNegative'),
    embedment: lengthQ(),
  }),
  concrete: z.object({
    fc: stressQ(),
    cracked: z.boolean().default(true),
  }),
  pier: z.object({ length: lengthQ(), width: lengthQ() }),
});

export type ConnectionInput = z.infer<typeof connectionSchema>;
