/**
 * The desk's current document handed to the reach study (saved or not): it travels in the router's
 * location state, like the desk proposal going the other way (desk-proposal.ts).
 */
import type { DesignDocument } from '../../shared/schemas/design';

export interface StudyStart {
  document: DesignDocument;
  /** The desk had unsaved changes when the study was opened. */
  unsaved: boolean;
}

export function studyState(start: StudyStart): { studyStart: StudyStart } {
  return { studyStart: start };
}

/** Reads the hand-over from `useLocation().state`, ignoring anything else that may be there. */
export function readStudyStart(state: unknown): StudyStart | null {
  if (!state || typeof state !== 'object' || !('studyStart' in state)) return null;
  const start = (state as { studyStart?: StudyStart }).studyStart;
  if (!start || typeof start.document !== 'object' || start.document === null) return null;
  return { document: start.document, unsaved: Boolean(start.unsaved) };
}
