import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { CantileverDto, createCantileverSchema } from '../../../../shared/schemas/api';
import { apiPost } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';

export type CreateCantileverBody = z.input<typeof createCantileverSchema>;

export function createCantilever(projectId: number, body: CreateCantileverBody): Promise<CantileverDto> {
  return apiPost<CantileverDto>(`/api/projects/${projectId}/cantilevers`, { ...body });
}

export function useCreateCantilever(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateCantileverBody) => createCantilever(projectId, body),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) });
      void queryClient.invalidateQueries({ queryKey: projectKeys.list() });
    },
  });
}
