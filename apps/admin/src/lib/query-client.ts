import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client';

/** A 4xx answer will not change by asking again; network trouble and 5xx often do. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
