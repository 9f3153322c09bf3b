/**
 * A document as written (JSON from a file, a request or a form) to a result or to the field
 * problems that stop it: schema validation and the engine's own input checks in one call, the same
 * for the CLI, the API and the desk.
 */
import { parsedDesignSchema } from '../schemas/parsed-design';
import { toFieldIssues, type FieldIssue } from '../schemas/quantity';
import { evaluateDesign, type EvaluateOptions } from './design';
import { DesignInputError, type DesignResult } from './types';

export type CheckOutcome = { ok: true; result: DesignResult } | { ok: false; issues: FieldIssue[] };

/** Validates and parses `document` (parsedDesignSchema) and evaluates it; never throws for bad input. */
export function checkDocument(document: unknown, options: EvaluateOptions = {}): CheckOutcome {
  const parsed = parsedDesignSchema.safeParse(document);
  if (!parsed.success) return { ok: false, issues: toFieldIssues(parsed.error) };
  try {
    return { ok: true, result: evaluateDesign(parsed.data, options) };
  } catch (e) {
    if (e instanceof DesignInputError) return { ok: false, issues: e.issues };
    throw e;
  }
}
