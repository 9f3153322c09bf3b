import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AwaitingReviewDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../../lib/api-client';

export const awaitingKeys = { all: ['reviews', 'awaiting'] as const };

export function getAwaitingReviews(signal?: AbortSignal): Promise<AwaitingReviewDto[]> {
  return apiGet<AwaitingReviewDto[]>('/api/reviews/awaiting', signal);
}

/** Revisions waiting for the signed-in engineer's review; fetched only for engineers. */
export function useAwaitingReviews(enabled: boolean) {
  return useQuery({
    ...queryOptions({ queryKey: awaitingKeys.all, queryFn: ({ signal }) => getAwaitingReviews(signal) }),
    enabled,
    staleTime: 0,
  });
}
