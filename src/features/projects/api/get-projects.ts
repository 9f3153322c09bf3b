import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ProjectDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../../lib/api-client';
import { projectKeys } from '../../../lib/api/projects/project-keys';

export function getProjects(signal?: AbortSignal): Promise<ProjectDto[]> {
  return apiGet<ProjectDto[]>('/api/projects', signal);
}

export function projectsQueryOptions() {
  return queryOptions({ queryKey: projectKeys.list(), queryFn: ({ signal }) => getProjects(signal) });
}

export function useProjects() {
  return useQuery(projectsQueryOptions());
}
