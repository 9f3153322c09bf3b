import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateRevisionBody, RevisionDto, StaleSaveBody } from '../../../../shared/schemas/api';
import { ApiError, apiPost } from '../../api-client';
import { cantileverKeys } from '../cantilevers/cantilever-keys';
import { projectKeys } from '../projects/project-keys';
import { revisionKeys } from './revision-keys';

export function saveRevision(cantileverId: number, body: CreateRevisionBody): Promise<RevisionDto> {
  return apiPost<RevisionDto>(`/api/cantilevers/${cantileverId}/revisions`, { ...body });
}

/** The latest revision from a 409 answer to a stale save, or null for any other error. */
export function staleLatest(error: unknown): RevisionDto | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const body = error.body as Partial<StaleSaveBody> | null;
  return body?.latest ?? null;
}

export function useSaveRevision(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateRevisionBody) => saveRevision(cantileverId, body),
    onSuccess: (revision) => {
      queryClient.setQueryData(revisionKeys.detail(revision.id), revision);
      void queryClient.invalidateQueries({ queryKey: revisionKeys.list(cantileverId) });
      void queryClient.invalidateQueries({ queryKey: cantileverKeys.detail(cantileverId) });
      void queryClient.invalidateQueries({ queryKey: projectKeys.all });
    },
  });
}
