import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { OutboxDto } from '../../../../shared/schemas/api';
import { adminKeys } from './admin-keys';

export function getOutbox(signal?: AbortSignal): Promise<OutboxDto[]> {
  return apiGet<OutboxDto[]>('/api/admin/outbox', signal);
}

/** Newest first. */
export function sortOutbox(mails: OutboxDto[]): OutboxDto[] {
  return [...mails].sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id - a.id);
}

export function outboxQueryOptions() {
  return queryOptions({
    queryKey: adminKeys.outbox(),
    queryFn: ({ signal }) => getOutbox(signal),
    select: sortOutbox,
    staleTime: 0,
  });
}

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}
