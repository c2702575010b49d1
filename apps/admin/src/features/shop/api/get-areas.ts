import { areaListSchema, type Area } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

/** The shop's rooms in its own order, which the server keeps. */
export function getAreas(signal?: AbortSignal): Promise<Area[]> {
  return api.get('/areas', { schema: areaListSchema, signal });
}

export function areasQueryOptions() {
  return queryOptions({
    queryKey: shopKeys.areas(),
    queryFn: ({ signal }) => getAreas(signal),
    staleTime: 10 * 60_000,
  });
}

export function useAreas() {
  return useQuery(areasQueryOptions());
}
