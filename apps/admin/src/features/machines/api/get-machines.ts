import { machineListSchema, type MachineDetail } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

export function getMachines(signal?: AbortSignal): Promise<MachineDetail[]> {
  return api.get('/machines', { schema: machineListSchema, signal });
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
