/**
 * The design document: one whole cantilever design. The same schema validates it in the browser,
 * in every API route that takes it, and in the command-line check. Key names are fixed by the
 * engine contract; fields may be added, never renamed.
 */
import { z } from 'zod';
import { memberSchema, loadsSchema } from './member';
import { connectionSchema } from './connection';
import { quantityString } from './quantity';

export const designSchema = z.object({
  units: z.enum(['US', 'SI'], { error: 'must be "US" or "SI"' }).default('US'),
  method: z.enum(['LRFD', 'ASD'], { error: 'must be "LRFD" or "ASD"' }).default('LRFD'),
  member: memberSchema,
  loads: loadsSchema.default({ selfWeight: true, area: [], line: [], point: [] }),
  deflectionLimits: z
    .object({
      live: z.number({ error: 'must be a number (span/ratio)' }).positive('must be positive').default(360),
      total: z.number({ error: 'must be a number (span/ratio)' }).positive('must be positive').default(240),
    })
    .default({ live: 360, total: 240 }),
  frequencyMin: quantityString('frequency').optional(),
  connection: connectionSchema.optional(),
});

/** A validated design document (defaults filled in). */
export type DesignInput = z.infer<typeof designSchema>;
/** A design document as written by a person or a script, before defaults. */
export type DesignDocument = z.input<typeof designSchema>;
