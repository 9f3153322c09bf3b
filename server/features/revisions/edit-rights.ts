/**
 * Who may change which part of a design (EDIT_RIGHTS in shared/schemas/api.ts): the new input is
 * compared field by field with the base revision's input. `units` only chooses the units the
 * results are shown in, so anyone with a design role may change it. A first revision (no base)
 * changes nothing that exists, so any design role may start a cantilever from a whole document
 * (e.g. the desk's example design); the rights govern every change after that.
 */
import { EDIT_RIGHTS, type Role } from '../../../shared/schemas/api';
import { diffDesigns, documentPart } from '../../../shared/schemas/diff';
import type { FieldIssue } from '../../../shared/schemas/quantity';
import { forbidden } from '../../lib/http-error';

const FREE_PARTS = new Set(['units']);

export function assertMayChange(role: Role, before: unknown, after: unknown): void {
  const rights = EDIT_RIGHTS[role];
  if (!rights.member && !rights.connection) throw forbidden(`Your role (${role}) may not save designs.`);
  if (before === undefined) return;
  const issues: FieldIssue[] = [];
  for (const change of diffDesigns(before, after)) {
    const part = documentPart(change.path);
    if (FREE_PARTS.has(part)) continue;
    const allowed = part === 'connection' ? rights.connection : rights.member;
    if (!allowed) {
      issues.push({
        path: `input.${change.path}`,
        message:
          part === 'connection'
            ? `a ${role} may not change the connection`
            : `a ${role} may change only the connection`,
      });
    }
  }
  if (issues.length > 0) {
    const fields = issues
      .slice(0, 5)
      .map((i) => i.path)
      .join(', ');
    throw forbidden(
      `Your role (${role}) may not change ${fields}${issues.length > 5 ? ` and ${issues.length - 5} more` : ''}.`,
      issues,
    );
  }
}
