/** Everything the calculation package prints, gathered before a single line is drawn. */
import type { PlateLayout } from '../../../shared/engine/connection/plate-layout';
import type { PlateScheduleRow } from '../../../shared/engine/connection/plate-schedule';
import type { DesignResult } from '../../../shared/engine/types';
import type { DesignInput } from '../../../shared/schemas/design';

export interface PackageData {
  projectName: string;
  site: string;
  codeBasis: string;
  cantileverName: string;
  quantity: number;
  revision: {
    number: number | null;
    /** How many revisions the cantilever has (null for a file). */
    of: number | null;
    message: string;
    author: string;
    /** ISO time the revision was saved; the package's fixed creation date. */
    createdAt: string;
    /** 'draft' | 'submitted' | 'approved' | 'changes-requested', or 'not stored' for a file. */
    reviewState: string;
    approvedBy: string | null;
    approvedAt: string | null;
  };
  engineVersion: string;
  inputSha256: string;
  resultSha256: string;
  input: DesignInput;
  result: DesignResult;
  layout: PlateLayout | null;
  scheduleRow: PlateScheduleRow | null;
}

export function isApproved(data: PackageData): boolean {
  return data.revision.reviewState === 'approved' && data.revision.approvedBy !== null;
}

/** The stamp on every page. */
export function stampText(data: PackageData): string {
  if (isApproved(data))
    return `Approved by ${data.revision.approvedBy} on ${(data.revision.approvedAt ?? '').slice(0, 10)}`;
  return 'PRELIMINARY, NOT FOR CONSTRUCTION';
}

export function revisionLabel(data: PackageData): string {
  const r = data.revision;
  if (r.number === null) return 'unsaved design file';
  return r.of === null ? `Revision ${r.number}` : `Revision ${r.number} of ${r.of}`;
}
