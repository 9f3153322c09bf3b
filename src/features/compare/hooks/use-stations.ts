import type { RevisionDto } from '../../../../shared/schemas/api';
import type { Stations } from '../../../../shared/engine/types';

/**
 * The station arrays of a stored revision. Every save computes them on the server (with the
 * project's own sections) and stores them with the result, so they are read, never recomputed
 * here: the browser does not hold a project's imported shapes.
 */
export function useStations(revision: RevisionDto | undefined): { stations: Stations | undefined } {
  return { stations: revision?.result.stations ?? undefined };
}
