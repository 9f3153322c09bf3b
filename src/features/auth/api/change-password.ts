import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserDto } from '../../../../shared/schemas/api';
import type { ChangePasswordBody } from '../../../../shared/schemas/auth';
import { apiPost } from '../../../lib/api-client';
import { authKeys } from '../../../lib/api/me/auth-keys';

/** Changes one's own password; the server ends the account's other sessions and keeps this one. */
export function changePassword(body: ChangePasswordBody): Promise<UserDto> {
  return apiPost<UserDto>('/api/auth/password', { ...body });
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    onSuccess: (user) => {
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
