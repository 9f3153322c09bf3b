import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShapesDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../api-client';
import { shapeKeys } from './shape-keys';

/**
 * The whole shapes table one project sees (published, the organisation's imports and the
 * project's own): a few hundred rows, filtered in the browser. No project: the organisation's.
 */
export function getShapes(projectId?: number, signal?: AbortSignal): Promise<ShapesDto> {
  return apiGet<ShapesDto>(projectId ? `/api/shapes?projectId=${projectId}` : '/api/shapes', signal);
}

export function shapesQueryOptions(projectId?: number) {
  return queryOptions({
    queryKey: shapeKeys.list(projectId),
    queryFn: ({ signal }) => getShapes(projectId, signal),
    staleTime: 5 * 60_000,
  });
}

export function useShapes(projectId?: number) {
  return useQuery(shapesQueryOptions(projectId));
}
