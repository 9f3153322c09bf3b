import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '../../api-client';
import { authKeys } from './auth-keys';

export function logout(): Promise<void> {
  return apiPost<void>('/api/auth/logout');
}

/** Signs out and forgets every cached answer (the next person sees nothing of the last one's). */
export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
