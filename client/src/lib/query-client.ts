import { QueryClient } from '@tanstack/react-query';
import { ApiError, NETWORK_ERROR_STATUS } from './api-client';

// A 4xx will not change by asking again; a dropped connection or a 5xx may.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status !== NETWORK_ERROR_STATUS && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}
