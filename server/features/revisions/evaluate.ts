/**
 * Runs the shared engine on the server with the built-in and the imported shapes. A semantic
 * problem the schema cannot see (an unknown shape, a load past the tip) answers 400 with the
 * engine's field issues, prefixed with the request field that held the document.
 */
import type { Knex } from 'knex';
import { evaluateDesign } from '../../../shared/engine/design';
import { lookupWith } from '../../../shared/engine/shapes/table';
import { DesignInputError, type DesignResult } from '../../../shared/engine/types';
import type { DesignInput } from '../../../shared/schemas/design';
import { badRequest } from '../../lib/http-error';
import { listCustomShapes } from '../shapes/shapes.repository';

export async function evaluateOnServer(
  db: Knex | Knex.Transaction,
  input: DesignInput,
  options: { stations: boolean; field?: string },
): Promise<DesignResult> {
  const shapes = lookupWith(await listCustomShapes(db));
  try {
    return evaluateDesign(input, { stations: options.stations, shapes });
  } catch (err) {
    if (err instanceof DesignInputError) {
      const prefix = options.field ?? 'input';
      const issues = err.issues.map((i) => ({ path: `${prefix}.${i.path}`, message: i.message }));
      throw badRequest(`The design cannot be computed: ${issues[0]?.path}: ${issues[0]?.message}`, issues);
    }
    throw err;
  }
}
