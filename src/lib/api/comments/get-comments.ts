import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../api-client';
import type { CommentDto } from '../../../../shared/schemas/api';
import { commentKeys } from './comment-keys';

export function getComments(revisionId: number, signal?: AbortSignal): Promise<CommentDto[]> {
  return apiGet<CommentDto[]>(`/api/revisions/${revisionId}/comments`, signal);
}

export function commentsQueryOptions(revisionId: number) {
  return queryOptions({
    queryKey: commentKeys.list(revisionId),
    queryFn: ({ signal }) => getComments(revisionId, signal),
  });
}

export function useComments(revisionId: number, enabled = true) {
  return useQuery({ ...commentsQueryOptions(revisionId), enabled });
}
