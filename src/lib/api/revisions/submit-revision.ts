import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../api-client';
import type { SubmitResponse } from '../../../../shared/schemas/api';
import { revisionKeys } from './revision-keys';
import { cantileverKeys } from '../cantilevers/cantilever-keys';
import { projectKeys } from '../projects/project-keys';

/** Asks the project's engineers to review a revision (the server e-mails them and says whom). */
export function submitRevision(revisionId: number, note = ''): Promise<SubmitResponse> {
  return apiPost<SubmitResponse>(`/api/revisions/${revisionId}/submit`, { note });
}

export function useSubmitRevision(cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ revisionId, note }: { revisionId: number; note?: string }) =>
      submitRevision(revisionId, note),
    onSuccess: (_answer, { revisionId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: revisionKeys.list(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: revisionKeys.detail(revisionId) }),
        queryClient.invalidateQueries({ queryKey: cantileverKeys.detail(cantileverId) }),
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['reviews', 'awaiting'] }),
      ]),
  });
}
