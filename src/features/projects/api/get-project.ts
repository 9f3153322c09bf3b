import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProjectDetailDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';

export function getProject(projectId: number, signal?: AbortSignal): Promise<ProjectDetailDto> {
  return apiGet<ProjectDetailDto>(`/api/projects/${projectId}`, signal);
}

export function projectQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: projectKeys.detail(projectId),
    queryFn: ({ signal }) => getProject(projectId, signal),
  });
}

export function useProject(projectId: number) {
  return useQuery(projectQueryOptions(projectId));
}
