import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { createProjectSchema, ProjectDto } from '../../../../shared/schemas/api';
import { apiPost } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';

export type CreateProjectBody = z.input<typeof createProjectSchema>;

export function createProject(body: CreateProjectBody): Promise<ProjectDto> {
  return apiPost<ProjectDto>('/api/projects', { ...body });
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.list() }),
  });
}
