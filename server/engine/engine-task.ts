/**
 * One engine run as a pool task: a parsed document (parsedDesignSchema), the imported shapes in scope, and whether
 * the stations are wanted. It answers the result already as JSON text (the stringify is a large
 * part of the work and belongs off the event loop too), or the engine's field issues.
 */
import { evaluateDesign } from '../../shared/engine/design';
import { findShape, lookupWith } from '../../shared/engine/shapes/table';
import type { ShapeLookup, ShapeRecord } from '../../shared/engine/shapes/types';
import { DesignInputError } from '../../shared/engine/types';
import type { ParsedDesign } from '../../shared/schemas/parsed-design';

export interface EngineTask {
  input: ParsedDesign;
  /**
   * The imported shapes in scope, or 'built-in first': the published table only, and the answer
   * 'needs imported shapes' when the document names a shape that is not in it. Imports can never
   * replace a built-in label (shape-csv.ts), so a run that found every shape there is the answer
   * the imported shapes would have given, without reading them.
   */
  custom: ShapeRecord[] | 'built-in first';
  stations: boolean;
}

export type EngineAnswer =
  | { ok: true; json: string }
  | { ok: false; issues: { path: string; message: string }[] }
  | { ok: false; needsImportedShapes: true };

/** One lookup function for every built-in-first run (the engine caches per lookup function). */
let missed = false;
const builtInOnly: ShapeLookup = (label) => {
  const shape = findShape(label);
  if (!shape) missed = true;
  return shape;
};

export function runEngineTask(task: EngineTask): EngineAnswer {
  const shapes = task.custom === 'built-in first' ? builtInOnly : lookupWith(task.custom);
  missed = false;
  try {
    const result = evaluateDesign(task.input, { stations: task.stations, shapes });
    if (missed) return { ok: false, needsImportedShapes: true };
    return { ok: true, json: JSON.stringify(result) };
  } catch (err) {
    if (missed) return { ok: false, needsImportedShapes: true };
    if (err instanceof DesignInputError) return { ok: false, issues: err.issues };
    throw err;
  }
}
