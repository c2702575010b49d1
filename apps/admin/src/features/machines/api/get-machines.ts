import { machineListSchema, type Machine } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

export async function getMachines(signal?: AbortSignal): Promise<Machine[]> {
  const { items } = await api.get('/machines', { schema: machineListSchema, signal });
  return items;
}

export function machinesQueryOptions() {
  return queryOptions({
    queryKey: machineKeys.list(),
    queryFn: ({ signal }) => getMachines(signal),
  });
}

export function useMachines() {
  return useQuery(machinesQueryOptions());
}
