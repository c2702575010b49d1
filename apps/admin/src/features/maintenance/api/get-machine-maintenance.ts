import { machineMaintenanceSchema, type MachineMaintenance } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { maintenanceKeys } from './maintenance-keys';

/** One machine's tasks, active or not, and the record of the work done on it, newest first. */
export function getMachineMaintenance(machineId: string, signal?: AbortSignal): Promise<MachineMaintenance> {
  return api.get(`/machines/${encodeURIComponent(machineId)}/maintenance`, { schema: machineMaintenanceSchema, signal });
}

export function machineMaintenanceQueryOptions(machineId: string) {
  return queryOptions({ queryKey: maintenanceKeys.machine(machineId), queryFn: ({ signal }) => getMachineMaintenance(machineId, signal) });
}

export function useMachineMaintenance(machineId: string) {
  return useQuery(machineMaintenanceQueryOptions(machineId));
}
