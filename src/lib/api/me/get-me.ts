import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserDto } from '../../../../shared/schemas/api';
import { ApiError, apiGet } from '../../api-client';
import { authKeys } from './auth-keys';

/** The signed-in person, or null when nobody is signed in (401). */
export async function getMe(signal?: AbortSignal): Promise<UserDto | null> {
  try {
    return await apiGet<UserDto>('/api/auth/me', signal);
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
