import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShapesDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../api-client';
import { shapeKeys } from './shape-keys';

/** The whole shapes table (published plus imported): a few hundred rows, filtered in the browser. */
export function getShapes(signal?: AbortSignal): Promise<ShapesDto> {
  return apiGet<ShapesDto>('/api/shapes', signal);
}

export function shapesQueryOptions() {
  return queryOptions({
    queryKey: shapeKeys.list(),
    queryFn: ({ signal }) => getShapes(signal),
    staleTime: 5 * 60_000,
  });
}

export function useShapes() {
  return useQuery(shapesQueryOptions());
}
