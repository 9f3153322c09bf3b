import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CantileverDto } from '../../../../shared/schemas/api';
import { apiPatch } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';

/** The number of identical beams a cantilever stands for (the plate schedule's quantity). */
export function useUpdateCantileverQuantity(projectId: number, cantileverId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (quantity: number) =>
      apiPatch<CantileverDto>(`/api/cantilevers/${cantileverId}`, { quantity }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) });
    },
  });
}
