import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** Client errors (4xx) will not change on a retry; server and network errors might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.statusCode < 500) return false;
  return failureCount < 2;
}

export const queryConfig = {
  queries: {
    retry: shouldRetry,
    refetchOnWindowFocus: false,
    staleTime: 30_000,
  },
  mutations: {
    retry: false,
  },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}
