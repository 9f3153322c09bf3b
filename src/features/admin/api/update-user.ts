import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPatch } from '../../../lib/api-client';
import type { updateUserSchema, UserDto } from '../../../../shared/schemas/api';
import { adminKeys } from './admin-keys';

export type UpdateUserBody = z.output<typeof updateUserSchema>;

export function updateUser(userId: number, body: UpdateUserBody): Promise<UserDto> {
  return apiPatch<UserDto>(`/api/admin/users/${userId}`, { ...body });
}

/** Changes a role or (de)activates an account; every project's member list may show it. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, body }: { userId: number; body: UpdateUserBody }) => updateUser(userId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.all }),
  });
}
