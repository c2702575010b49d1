import { machineDetailSchema, type MachineDetail, type MachineInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

export function createMachine(input: MachineInput): Promise<MachineDetail> {
  return api.post('/machines', { body: input, schema: machineDetailSchema });
}

export function useCreateMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMachine,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: machineKeys.all }),
  });
}
