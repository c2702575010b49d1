import { healthSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '@/lib/api-client';

export const connectionKeys = {
  all: ['connection'] as const,
  health: () => [...connectionKeys.all, 'health'] as const,
};

export function getHealth(signal?: AbortSignal) {
  return apiGet('/health', healthSchema, signal);
}

export const healthQueryOptions = () =>
  queryOptions({
    queryKey: connectionKeys.health(),
    queryFn: ({ signal }) => getHealth(signal),
    // A wall screen is never focused, so it asks on a timer; one failed answer is enough to say so.
    refetchInterval: 15_000,
    refetchIntervalInBackground: true,
    retry: false,
  });

export function useHealth() {
  return useQuery(healthQueryOptions());
}
