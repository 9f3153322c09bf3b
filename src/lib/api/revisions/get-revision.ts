import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RevisionDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../api-client';
import { revisionKeys } from './revision-keys';

export function getRevision(revisionId: number, signal?: AbortSignal): Promise<RevisionDto> {
  return apiGet<RevisionDto>(`/api/revisions/${revisionId}`, signal);
}

export function revisionQueryOptions(revisionId: number) {
  return queryOptions({
    queryKey: revisionKeys.detail(revisionId),
    queryFn: ({ signal }) => getRevision(revisionId, signal),
    staleTime: Infinity, // revisions are immutable
  });
}

export function useRevision(revisionId: number | null) {
  return useQuery({ ...revisionQueryOptions(revisionId ?? 0), enabled: revisionId !== null });
}
