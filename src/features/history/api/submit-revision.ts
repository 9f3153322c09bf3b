import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../../lib/api-client';
import type { RevisionDto } from '../../../../shared/schemas/api';
import { revisionKeys } from '../../../lib/api/revisions/revision-keys';
import { cantileverKeys } from '../../../lib/api/cantilevers/cantilever-keys';
import { projectKeys } from '../../../lib/api/projects/project-keys';

/** Asks the project's engineers to review a revision (the server e-mails them). */
export function submitRevision(revisionId: number): Promise<RevisionDto> {
  return apiPost<RevisionDto>(`/api/revisions/${revisionId}/submit`);
}

export function useSubmitRevision(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitRevision,
    onSuccess: (_review, revisionId) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: revisionKeys.list(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: revisionKeys.detail(revisionId) }),
        queryClient.invalidateQueries({ queryKey: cantileverKeys.detail(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
      ]),
  });
}
