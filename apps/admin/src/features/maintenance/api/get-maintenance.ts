import { maintenanceTaskSchema, type MaintenanceTask } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { maintenanceKeys } from './maintenance-keys';

const maintenanceListSchema = z.array(maintenanceTaskSchema);

/** Every active task of every machine, with whether it is due. */
export function getMaintenance(signal?: AbortSignal): Promise<MaintenanceTask[]> {
  return api.get('/maintenance', { schema: maintenanceListSchema, signal });
}

export function maintenanceQueryOptions() {
  return queryOptions({ queryKey: maintenanceKeys.list(), queryFn: ({ signal }) => getMaintenance(signal) });
}

export function useMaintenance() {
  return useQuery(maintenanceQueryOptions());
}
