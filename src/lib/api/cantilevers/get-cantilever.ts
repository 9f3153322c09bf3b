import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CantileverDto } from '../../../../shared/schemas/api';
import { apiGet } from '../../api-client';
import { cantileverKeys } from './cantilever-keys';

export function getCantilever(cantileverId: number, signal?: AbortSignal): Promise<CantileverDto> {
  return apiGet<CantileverDto>(`/api/cantilevers/${cantileverId}`, signal);
}

export function cantileverQueryOptions(cantileverId: number) {
  return queryOptions({
    queryKey: cantileverKeys.detail(cantileverId),
    queryFn: ({ signal }) => getCantilever(cantileverId, signal),
  });
}

export function useCantilever(cantileverId: number) {
  return useQuery(cantileverQueryOptions(cantileverId));
}
