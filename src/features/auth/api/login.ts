import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserDto } from '../../../../shared/schemas/api';
import type { LoginBody } from '../../../../shared/schemas/auth';
import { apiPost } from '../../../lib/api-client';
import { authKeys } from '../../../lib/api/me/auth-keys';

export function login(body: LoginBody): Promise<UserDto> {
  return apiPost<UserDto>('/api/auth/login', { ...body });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (user) => {
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
