/** zod schemas for numeric route parameters (`/api/revisions/:revisionId`). */
import type { Request } from 'express';
import { z } from 'zod';

const id = z.coerce
  .number({ error: 'must be a number' })
  .int('must be a whole number')
  .positive('must be positive');

export function idParams<K extends string>(...names: K[]) {
  return z.object(Object.fromEntries(names.map((n) => [n, id])) as Record<K, typeof id>);
}

/** A numeric parameter that validate() has already parsed. */
export function paramId(req: Request, name: string): number {
  return Number(req.params[name]);
}
