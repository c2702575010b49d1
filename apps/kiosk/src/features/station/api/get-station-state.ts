import { stationStateSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '@/lib/api-client';
import { stationKeys } from './get-station';

export const stationStateKey = () => [...stationKeys.all, 'state'] as const;

// Another station or the heartbeat job can change what runs here; a quarter-minute is soon enough.
const STATE_REFRESH_MS = 15_000;

export function getStationState(signal?: AbortSignal) {
  return apiGet('/station/state', stationStateSchema, signal);
}

/** The running session and the supervisor on duty: a reload finds the running screen again. */
export function useStationState(enabled: boolean) {
  return useQuery(
    queryOptions({
      queryKey: stationStateKey(),
      queryFn: ({ signal }) => getStationState(signal),
      refetchInterval: STATE_REFRESH_MS,
      enabled,
    }),
  );
}
