import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../api-client';
import type { CommentDto } from '../../../../shared/schemas/api';
import { commentKeys } from './comment-keys';

export function createComment(revisionId: number, body: string): Promise<CommentDto> {
  return apiPost<CommentDto>(`/api/revisions/${revisionId}/comments`, { body });
}

export function useCreateComment(revisionId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => createComment(revisionId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: commentKeys.list(revisionId) }),
  });
}
