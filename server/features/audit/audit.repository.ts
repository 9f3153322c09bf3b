/** The audit trail: sign-ins, failed sign-ins, approvals, role changes. Append only. */
import type { Knex } from 'knex';
import { nowIso, toIso } from '../../db/knex';

export type AuditKind =
  | 'sign-in'
  | 'sign-in-failed'
  | 'sign-out'
  | 'approval'
  | 'changes-requested'
  | 'role-change'
  | 'account-created'
  | 'account-disabled'
  | 'account-enabled'
  | 'member-added'
  | 'member-removed'
  | 'password-changed'
  | 'password-reset'
  | 'attachment-deleted';

export interface AuditRow {
  id: number;
  kind: AuditKind;
  user_id: number | null;
  subject: string;
  detail: string;
  created_at: string;
}

export async function recordAudit(
  db: Knex | Knex.Transaction,
  entry: { kind: AuditKind; userId: number | null; subject: string; detail?: string },
): Promise<void> {
  await db('audit').insert({
    kind: entry.kind,
    user_id: entry.userId,
    subject: entry.subject.slice(0, 254),
    detail: entry.detail ?? '',
    created_at: nowIso(),
  });
}

export async function listAudit(db: Knex, kind?: AuditKind): Promise<(AuditRow & { createdAt: string })[]> {
  const q = db<AuditRow>('audit').orderBy('id', 'desc').limit(500);
  if (kind) q.where({ kind });
  const rows = await q;
  return rows.map((r) => ({ ...r, createdAt: toIso(r.created_at) }));
}
