import { useQuery } from '@tanstack/react-query';
import type { RevisionSummaryDto } from '../../../../shared/schemas/api';
import { revisionsQueryOptions } from '../../../lib/api/revisions/get-revisions';

/** Newest first, whatever order the server sends. */
export function sortNewestFirst(revisions: RevisionSummaryDto[]): RevisionSummaryDto[] {
  return [...revisions].sort((a, b) => b.number - a.number);
}

/** The cantilever's revisions for the timeline (the revisions feature's query, ordered newest first). */
export function useTimeline(cantileverId: number) {
  return useQuery({ ...revisionsQueryOptions(cantileverId), select: sortNewestFirst });
}
