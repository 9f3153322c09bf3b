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
    /** Supplementary reinforcement around the rods (ACI 318-19 17.5.3 condition A); engine default false. */
    supplementaryReinforcement: z.boolean().optional(),
    /** Rods pretensioned by torque: spacing and edge distance 6 da (ACI 318-19 17.9.2); engine default false. */
    torqued: z.boolean().optional(),
  }),
  concrete: z.object({
    fc: stressQ(),
    cracked: z.boolean().default(true),
    /** Lightweight-concrete factor lambda (ACI 318-19 19.2.4); engine default 1.0 (normal weight). */
    lambda: z
      .number({ error: 'must be a number between 0.75 and 1.0' })
      .min(0.75, 'must be at least 0.75 (all-lightweight concrete)')
      .max(1, 'must be at most 1.0 (normal-weight concrete)')
      .optional(),
  }),
  pier: z.object({
    length: lengthQ(),
    width: lengthQ(),
    /** Concrete thickness along the rods (ha); when absent the pier is taken as deep (psi_h,V = 1). */
    depth: lengthQ().optional(),
  }),
  /** Post-base only: the post from the top of the plate to the beam's centreline (Version 2 key). */
  post: z.object({ height: lengthQ() }).optional(),
  /** Fillet weld all around the member (or post) at the plate (Version 2 key). */
  weld: z
    .object({
      size: lengthQ(),
      electrode: z.enum(['E70', 'E80'], { error: 'must be "E70" or "E80"' }).default('E70'),
    })
    .optional(),
  /** The root rotates with the connection (rods, plate, post); engine default true (Version 2 key). */
  flexibleRoot: z.boolean().optional(),
});

export type ConnectionInput = z.infer<typeof connectionSchema>;
