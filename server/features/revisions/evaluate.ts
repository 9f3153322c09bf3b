/**
 * Runs the shared engine on the server with the built-in shapes and the imported shapes the
 * project sees (its own and the organisation's). A semantic problem the schema cannot see (an
 * unknown shape, a load past the tip) answers 400 with the engine's field issues, prefixed with the
 * request field that held the document.
 *
 * The catalog sections the engine looked up are returned with the result, so a revision stores
 * the properties it was computed with; `pinned` sections (those of the base revision) win over the
 * current table, so a later import can never change a re-run or the next save of a design.
 */
import type { Knex } from 'knex';
import { evaluateDesign } from '../../../shared/engine/design';
import { lookupWith, normalizeLabel } from '../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { DesignInputError, type DesignResult } from '../../../shared/engine/types';
import type { ParsedDesign } from '../../../shared/schemas/parsed-design';
import { badRequest } from '../../lib/http-error';
import { listShapesInScope } from '../shapes/shapes.repository';

export interface EvaluateOptions {
  stations: boolean;
  field?: string;
  /** The project whose imported shapes apply; null or absent: the organisation's only. */
  projectId?: number | null;
  /** Sections stored with the base revision; they win over the current table. */
  pinned?: readonly ShapeRecord[];
}

export async function evaluateWithSections(
  db: Knex | Knex.Transaction,
  input: ParsedDesign,
  options: EvaluateOptions,
): Promise<{ result: DesignResult; sections: ShapeRecord[] }> {
  const pinnedCustom = (options.pinned ?? []).filter((s) => s.custom);
  const base = lookupWith([...(await listShapesInScope(db, options.projectId ?? null)), ...pinnedCustom]);
  const used = new Map<string, ShapeRecord>();
  const shapes = (label: string) => {
    const found = base(label);
    if (found) used.set(normalizeLabel(label), found);
    return found;
  };
  try {
    const result = evaluateDesign(input, { stations: options.stations, shapes });
    return { result, sections: [...used.values()] };
  } catch (err) {
    if (err instanceof DesignInputError) throw designNotComputed(err.issues, options.field ?? 'input');
    throw err;
  }
}

/** The 400 for a document the engine refused, its issues' paths prefixed with the request field. */
export function designNotComputed(engineIssues: readonly { path: string; message: string }[], field: string) {
  const issues = engineIssues.map((i) => ({ path: `${field}.${i.path}`, message: i.message }));
  return badRequest(`The design cannot be computed: ${issues[0]?.path}: ${issues[0]?.message}`, issues);
}

export async function evaluateOnServer(
  db: Knex | Knex.Transaction,
  input: ParsedDesign,
  options: EvaluateOptions,
): Promise<DesignResult> {
  return (await evaluateWithSections(db, input, options)).result;
}

/** The sections a stored revision was computed with (none for revisions saved before they were kept). */
export function storedSections(sectionsJson: string | null | undefined): ShapeRecord[] {
  if (!sectionsJson) return [];
  return JSON.parse(sectionsJson) as ShapeRecord[];
}
