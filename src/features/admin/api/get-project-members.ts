import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '../../../lib/api-client';
import type { ProjectDetailDto } from '../../../../shared/schemas/api';
import { adminKeys } from './admin-keys';

export function getProject(projectId: number, signal?: AbortSignal): Promise<ProjectDetailDto> {
  return apiGet<ProjectDetailDto>(`/api/projects/${projectId}`, signal);
}

export function projectMembersQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: adminKeys.project(projectId),
    queryFn: ({ signal }) => getProject(projectId, signal),
    select: (project) => project.members,
  });
}

export function useProjectMembers(projectId: number) {
  return useQuery(projectMembersQueryOptions(projectId));
}
