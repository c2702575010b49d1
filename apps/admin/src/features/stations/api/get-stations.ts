import { stationListSchema, type Station } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { stationKeys } from './station-keys';

/** A device reports about once a minute, so asking as often keeps "last contact" and new pairings current. */
const REFRESH_MS = 60_000;

export function getStations(signal?: AbortSignal): Promise<Station[]> {
  return api.get('/stations', { schema: stationListSchema, signal });
}

export function stationsQueryOptions() {
  return queryOptions({
    queryKey: stationKeys.list(),
    queryFn: ({ signal }) => getStations(signal),
    refetchInterval: REFRESH_MS,
  });
}

export function useStations() {
  return useQuery(stationsQueryOptions());
}
