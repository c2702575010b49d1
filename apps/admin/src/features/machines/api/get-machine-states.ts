import { boardSchema, type Board } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

/** What the wall board shows, read by a signed-in person: every machine's state, live. */
export function getMachineStates(signal?: AbortSignal): Promise<Board> {
  return api.get('/board', { schema: boardSchema, signal });
}

export function machineStatesQueryOptions() {
  return queryOptions({
    queryKey: machineKeys.states(),
    queryFn: ({ signal }) => getMachineStates(signal),
    // Live events refetch it the moment something changes; they are hints and may be missed, so
    // a look every minute puts right whatever one missed.
    refetchInterval: 60_000,
  });
}

export function useMachineStates() {
  return useQuery(machineStatesQueryOptions());
}
