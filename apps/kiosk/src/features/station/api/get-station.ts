import { stationSelfSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet, isApiError } from '@/lib/api-client';

export const stationKeys = {
  all: ['station'] as const,
  self: () => [...stationKeys.all, 'self'] as const,
};

export function getStation(signal?: AbortSignal) {
  return apiGet('/station', stationSelfSchema, signal);
}

export const stationQueryOptions = () =>
  queryOptions({
    queryKey: stationKeys.self(),
    queryFn: ({ signal }) => getStation(signal),
    // 401 is an answer, not a failure: this screen is not paired (or no longer), so it asks for a code.
    retry: (_count, error) => !isApiError(error, 401),
    staleTime: Number.POSITIVE_INFINITY,
  });

export function useStation() {
  return useQuery(stationQueryOptions());
}
