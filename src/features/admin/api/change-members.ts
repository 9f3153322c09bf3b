import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiDelete, apiPost } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';
import { adminKeys } from './admin-keys';

/** The members show here and on the project page: refresh both. */
function refresh(queryClient: ReturnType<typeof useQueryClient>, projectId: number) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: adminKeys.project(projectId) }),
    queryClient.invalidateQueries({ queryKey: projectKeys.detail(projectId) }),
  ]);
}

export function addMember(projectId: number, userId: number): Promise<unknown> {
  return apiPost<unknown>(`/api/projects/${projectId}/members`, { userId });
}

export function removeMember(projectId: number, userId: number): Promise<unknown> {
  return apiDelete<unknown>(`/api/projects/${projectId}/members/${userId}`);
}

export function useAddMember(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => addMember(projectId, userId),
    onSuccess: () => refresh(queryClient, projectId),
  });
}

export function useRemoveMember(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(projectId, userId),
    onSuccess: () => refresh(queryClient, projectId),
  });
}
