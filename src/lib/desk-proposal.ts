/**
 * A design handed to the desk from another screen (the reach study's "load this point", the
 * lightest-sections list's "use this"): the desk opens with it as unsaved changes on top of the
 * cantilever's current revision and says where it came from. It travels in the router's location
 * state, so a reload or a shared link never carries it.
 */
import type { DesignDocument } from '../../shared/schemas/design';

export interface DeskProposal {
  /** Which screen made it, for the desk's notice. */
  source: 'study' | 'lightest-sections';
  /** What was chosen, in words: "length 12 ft, tip depth 8 in" or "W12X19". */
  label: string;
  document: DesignDocument;
}

export interface DeskLocationState {
  proposal?: DeskProposal;
}

/** The `state` to pass to `navigate(paths.desk(id), { state })`. */
export function proposalState(proposal: DeskProposal): DeskLocationState {
  return { proposal };
}

/** Reads a proposal from `useLocation().state`, ignoring anything else that may be there. */
export function readProposal(state: unknown): DeskProposal | null {
  if (!state || typeof state !== 'object' || !('proposal' in state)) return null;
  const proposal = (state as DeskLocationState).proposal;
  if (!proposal || typeof proposal.label !== 'string' || typeof proposal.document !== 'object') return null;
  return proposal;
}
