/**
 * One live computation: validate and parse the form's document with the shared schema (parsedDesignSchema), then run the shared
 * engine with the station arrays for the charts. Used by the web worker (and directly where no
 * worker exists, e.g. under jsdom). Never throws: every outcome is an answer.
 */
import { evaluateDesign } from '../../../../shared/engine/design';
import { lookupWith } from '../../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../../shared/engine/shapes/types';
import { DesignInputError, type DesignResult } from '../../../../shared/engine/types';
import { parsedDesignSchema } from '../../../../shared/schemas/parsed-design';
import { toFieldIssues, type FieldIssue } from '../../../../shared/schemas/quantity';

export type DesignAnswer =
  | { kind: 'result'; result: DesignResult; ms: number }
  | { kind: 'invalid'; issues: FieldIssue[]; ms: number }
  | { kind: 'error'; message: string; ms: number };

export function runDesign(doc: unknown, extraShapes: readonly ShapeRecord[] = []): DesignAnswer {
  const started = performance.now();
  const parsed = parsedDesignSchema.safeParse(doc);
  if (!parsed.success)
    return { kind: 'invalid', issues: toFieldIssues(parsed.error), ms: performance.now() - started };
  try {
    const result = evaluateDesign(parsed.data, { stations: true, shapes: lookupWith(extraShapes) });
    return { kind: 'result', result, ms: performance.now() - started };
  } catch (error) {
    if (error instanceof DesignInputError)
      return { kind: 'invalid', issues: error.issues, ms: performance.now() - started };
    const message = error instanceof Error ? error.message : String(error);
    return { kind: 'error', message, ms: performance.now() - started };
  }
}
