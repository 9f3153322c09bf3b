/**
 * One engine run as a pool task: a parsed document (parsedDesignSchema), the imported shapes in scope, and whether
 * the stations are wanted. It answers the result already as JSON text (the stringify is a large
 * part of the work and belongs off the event loop too), or the engine's field issues.
 */
import { evaluateDesign } from '../../shared/engine/design';
import { lookupWith } from '../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../shared/engine/shapes/types';
import { DesignInputError } from '../../shared/engine/types';
import type { ParsedDesign } from '../../shared/schemas/parsed-design';

export interface EngineTask {
  input: ParsedDesign;
  custom: ShapeRecord[];
  stations: boolean;
}

export type EngineAnswer =
  { ok: true; json: string } | { ok: false; issues: { path: string; message: string }[] };

export function runEngineTask(task: EngineTask): EngineAnswer {
  try {
    const result = evaluateDesign(task.input, { stations: task.stations, shapes: lookupWith(task.custom) });
    return { ok: true, json: JSON.stringify(result) };
  } catch (err) {
    if (err instanceof DesignInputError) return { ok: false, issues: err.issues };
    throw err;
  }
}
