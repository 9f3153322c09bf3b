import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** One QueryClient for the app: no retry on 4xx answers (they will not change by retrying). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failures, error) =>
          !(error instanceof ApiError && error.status >= 400 && error.status < 500) && failures < 2,
      },
      mutations: { retry: false },
    },
  });
}
