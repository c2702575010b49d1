import { maintenanceTaskSchema, type MaintenanceTask, type MaintenanceTaskInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { maintenanceKeys } from './maintenance-keys';

export type SaveMaintenanceTaskInput = { machineId: string; taskId: null; task: MaintenanceTaskInput } | { machineId: string; taskId: string; task: MaintenanceTaskInput };

/** Adds a task to the machine, or changes one it has. */
export function saveMaintenanceTask({ machineId, taskId, task }: SaveMaintenanceTaskInput): Promise<MaintenanceTask> {
  if (taskId === null) return api.post(`/machines/${encodeURIComponent(machineId)}/maintenance`, { body: task, schema: maintenanceTaskSchema });
  return api.put(`/maintenance/${encodeURIComponent(taskId)}`, { body: task, schema: maintenanceTaskSchema });
}

export function useSaveMaintenanceTask() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveMaintenanceTask,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: maintenanceKeys.all }),
  });
}
