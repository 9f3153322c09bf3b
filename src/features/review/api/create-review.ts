import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import type { RevisionDto, ReviewBody } from '../../../../shared/schemas/api';
import { revisionKeys } from '../../../lib/api/revisions/revision-keys';
import { cantileverKeys } from '../../../lib/api/cantilevers/cantilever-keys';
import { projectKeys } from '../../../lib/api/projects/project-keys';

export function createReview(revisionId: number, body: ReviewBody): Promise<RevisionDto> {
  return apiPost<RevisionDto>(`/api/revisions/${revisionId}/reviews`, { ...body });
}

/** The engineer's decision; afterwards the revision, its timeline and its cantilever are fetched again. */
export function useCreateReview(revisionId: number, cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReviewBody) => createReview(revisionId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: revisionKeys.detail(revisionId) }),
        queryClient.invalidateQueries({ queryKey: revisionKeys.list(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: cantileverKeys.detail(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
      ]),
  });
}
