import { maintenanceTaskSchema, type MaintenanceTask } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { maintenanceKeys } from './maintenance-keys';

/** Records the task done now, at the machine's meter now, with what was found or done. */
export function completeMaintenanceTask({ taskId, note }: { taskId: string; note: string }): Promise<MaintenanceTask> {
  return api.post(`/maintenance/${encodeURIComponent(taskId)}/complete`, { body: { note }, schema: maintenanceTaskSchema });
}

export function useCompleteMaintenanceTask() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: completeMaintenanceTask,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: maintenanceKeys.all }),
  });
}
