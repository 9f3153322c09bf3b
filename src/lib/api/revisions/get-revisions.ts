import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RevisionSummaryDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../api-client';
import { revisionKeys } from './revision-keys';

/** A cantilever's revisions, newest first as the server sends them. */
export function getRevisions(cantileverId: number, signal?: AbortSignal): Promise<RevisionSummaryDto[]> {
  return apiGet<RevisionSummaryDto[]>(`/api/cantilevers/${cantileverId}/revisions`, signal);
}

export function revisionsQueryOptions(cantileverId: number) {
  return queryOptions({
    queryKey: revisionKeys.list(cantileverId),
    queryFn: ({ signal }) => getRevisions(cantileverId, signal),
  });
}

/** A cantilever id of 0 (not known yet) fetches nothing. */
export function useRevisions(cantileverId: number) {
  return useQuery({ ...revisionsQueryOptions(cantileverId), enabled: cantileverId > 0 });
}
