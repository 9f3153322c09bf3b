/** User-imported shapes (Knex only). The published table is bundled in shared/engine/shapes. */
import type { Knex } from 'knex';
import type { ShapeRecord } from '../../../shared/engine/shapes/types';
import { nowIso } from '../../db/knex';

type Db = Knex | Knex.Transaction;

interface ShapeRow {
  id: number;
  label: string;
  family: ShapeRecord['family'];
  props_json: string;
  imported_by: number;
  created_at: string;
}

export async function listCustomShapes(db: Db): Promise<ShapeRecord[]> {
  const rows = await db<ShapeRow>('shapes').orderBy('label');
  return rows.map((r) => ({
    ...(JSON.parse(r.props_json) as ShapeRecord),
    label: r.label,
    family: r.family,
    custom: true,
  }));
}

/** Inserts or replaces custom shapes by label; returns how many were written. */
export async function upsertCustomShapes(db: Knex, shapes: ShapeRecord[], userId: number): Promise<number> {
  if (shapes.length === 0) return 0;
  await db.transaction(async (trx) => {
    for (const s of shapes) {
      const { label, family, ...props } = s;
      await trx('shapes')
        .insert({
          label,
          family,
          props_json: JSON.stringify({ ...props, custom: true }),
          imported_by: userId,
          created_at: nowIso(),
        })
        .onConflict('label')
        .merge(['family', 'props_json', 'imported_by', 'created_at']);
    }
  });
  return shapes.length;
}
