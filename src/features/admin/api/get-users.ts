import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { UserDto } from '../../../../shared/schemas/api';
import { adminKeys } from './admin-keys';

export function getUsers(signal?: AbortSignal): Promise<UserDto[]> {
  return apiGet<UserDto[]>('/api/admin/users', signal);
}

export function usersQueryOptions() {
  return queryOptions({ queryKey: adminKeys.users(), queryFn: ({ signal }) => getUsers(signal) });
}

export function useUsers(enabled = true) {
  return useQuery({ ...usersQueryOptions(), enabled });
}
