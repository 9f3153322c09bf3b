import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPost } from '../../../lib/api-client';
import type { createUserSchema, UserDto } from '../../../../shared/schemas/api';
import { adminKeys } from './admin-keys';

export type CreateUserBody = z.output<typeof createUserSchema>;

export function createUser(body: CreateUserBody): Promise<UserDto> {
  return apiPost<UserDto>('/api/admin/users', { ...body });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.users() }),
  });
}
