import { useQuery } from '@tanstack/react-query';
import type { RevisionDto } from '../../../../shared/schemas/api';
import type { Stations } from '../../../../shared/engine/types';
import { revisionKeys } from '../../../lib/api/revisions/revision-keys';

/**
 * The station arrays of a stored revision: the stored ones when the server kept them, otherwise the
 * shared engine re-runs the revision's own input in the browser (loaded only when needed).
 */
async function computeStations(revision: RevisionDto): Promise<Stations | null> {
  const [{ evaluateDesign }, { designSchema }] = await Promise.all([
    import('../../../../shared/engine/design'),
    import('../../../../shared/schemas/design'),
  ]);
  const result = evaluateDesign(designSchema.parse(revision.input), { stations: true });
  return result.stations ?? null;
}

export function useStations(revision: RevisionDto | undefined) {
  const stored = revision?.result.stations;
  const computed = useQuery({
    queryKey: [...revisionKeys.detail(revision?.id ?? 0), 'stations'],
    queryFn: () => computeStations(revision as RevisionDto),
    enabled: Boolean(revision) && !stored,
    staleTime: Infinity,
  });
  return {
    stations: stored ?? computed.data ?? undefined,
    pending: !stored && computed.isPending && Boolean(revision),
    error: computed.error,
  };
}
