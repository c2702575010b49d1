import { machineDetailSchema, type MachineDetail, type MachineInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

export interface UpdateMachineInput {
  id: string;
  machine: MachineInput;
}

export function updateMachine({ id, machine }: UpdateMachineInput): Promise<MachineDetail> {
  return api.put(`/machines/${encodeURIComponent(id)}`, { body: machine, schema: machineDetailSchema });
}

export function useUpdateMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMachine,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: machineKeys.all }),
  });
}
