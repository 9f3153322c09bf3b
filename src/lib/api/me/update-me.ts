import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateMeBody, UserDto } from '../../../../shared/schemas/api';
import { apiPatch } from '../../api-client';
import { authKeys } from './auth-keys';

export function updateMe(body: UpdateMeBody): Promise<UserDto> {
  return apiPatch<UserDto>('/api/auth/me', { ...body });
}

/** Changes the person's own settings; the unit choice shows at once and is kept on the server. */
export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onMutate: (body) => {
      const before = queryClient.getQueryData<UserDto | null>(authKeys.me());
      if (before) queryClient.setQueryData(authKeys.me(), { ...before, ...body });
      return { before };
    },
    onError: (_error, _body, context) => {
      if (context?.before) queryClient.setQueryData(authKeys.me(), context.before);
    },
    onSuccess: (user) => queryClient.setQueryData(authKeys.me(), user),
  });
}
