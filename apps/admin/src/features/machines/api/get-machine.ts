import { machineDetailSchema, type MachineDetail } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

export function getMachine(id: string, signal?: AbortSignal): Promise<MachineDetail> {
  return api.get(`/machines/${encodeURIComponent(id)}`, { schema: machineDetailSchema, signal });
}

export function machineQueryOptions(id: string) {
  return queryOptions({
    queryKey: machineKeys.detail(id),
    queryFn: ({ signal }) => getMachine(id, signal),
  });
}

export function useMachine(id: string) {
  return useQuery(machineQueryOptions(id));
}
