/** zod schemas for numeric route parameters (`/api/revisions/:revisionId`). */
import { z } from 'zod';

const id = z.coerce
  .number({ error: 'must be a number' })
  .int('must be a whole number')
  .positive('must be positive');

export function idParams<K extends string>(...names: K[]) {
  return z.object(Object.fromEntries(names.map((n) => [n, id])) as Record<K, typeof id>);
}
