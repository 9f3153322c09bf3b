/**
 * User-imported shapes (Knex only). A shape belongs to one project, or to the organisation
 * (project_id null, imported by an admin). Shapes are only ever inserted: a label taken in a scope
 * is never replaced. The published table is bundled in shared/engine/shapes.
 */
import type { Knex } from 'knex';
import { normalizeLabel } from '../../../shared/engine/shapes/table';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { nowIso } from '../../db/knex';

type Db = Knex | Knex.Transaction;

interface ShapeRow {
  id: number;
  label: string;
  family: ShapeRecord['family'];
  props_json: string;
  imported_by: number;
  project_id: number | null;
  created_at: string;
}

/** Where an import lands: one project, or the organisation (null). */
export type ShapeScope = { projectId: number | null };

function toRecord(r: ShapeRow): ShapeRecord {
  return { ...(JSON.parse(r.props_json) as ShapeRecord), label: r.label, family: r.family, custom: true };
}

/**
 * The imported shapes a project sees: the organisation's, then the project's own (a project's
 * shape wins over an organisation shape of the same label, so an admin's later import cannot
 * change a project's designs). Without a project, the organisation's only.
 */
export async function listShapesInScope(db: Db, projectId: number | null): Promise<ShapeRecord[]> {
  const rows = await db<ShapeRow>('shapes')
    .where((q) => {
      q.whereNull('project_id');
      if (projectId !== null) q.orWhere('project_id', projectId);
    })
    .orderBy('label');
  const byLabel = new Map<string, ShapeRecord>();
  for (const r of rows.filter((row) => row.project_id === null))
    byLabel.set(normalizeLabel(r.label), toRecord(r));
  for (const r of rows.filter((row) => row.project_id !== null))
    byLabel.set(normalizeLabel(r.label), toRecord(r));
  return [...byLabel.values()].sort((a, b) => a.label.localeCompare(b.label));
}

/** The labels among `labels` already taken where an import into `scope` would be seen. */
export async function takenLabels(db: Db, scope: ShapeScope, labels: string[]): Promise<Set<string>> {
  if (labels.length === 0) return new Set();
  const rows = await db<ShapeRow>('shapes')
    .whereIn('label', labels)
    .where((q) => {
      q.whereNull('project_id');
      if (scope.projectId !== null) q.orWhere('project_id', scope.projectId);
    })
    .select('label');
  return new Set(rows.map((r) => r.label));
}

/** Inserts new shapes into one scope (never replacing: a taken label fails the transaction). */
export async function insertShapes(
  db: Knex,
  scope: ShapeScope,
  shapes: ShapeRecord[],
  userId: number,
): Promise<number> {
  if (shapes.length === 0) return 0;
  await db.transaction(async (trx) => {
    for (const s of shapes) {
      const { label, family, ...props } = s;
      await trx('shapes').insert({
        label,
        family,
        props_json: JSON.stringify({ ...props, custom: true }),
        imported_by: userId,
        project_id: scope.projectId,
        created_at: nowIso(),
      });
    }
  });
  return shapes.length;
}
