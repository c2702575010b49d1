import { tagOutSchema, type TagOut, type TagOutCreate } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../machines/api/machine-keys';
import { tagOutKeys } from './tag-out-keys';

export interface TagOutMachineInput {
  machineId: string;
  tagOut: TagOutCreate;
}

/** Reports a problem: the machine is out of service at once, and the admins are mailed. */
export function tagOutMachine({ machineId, tagOut }: TagOutMachineInput): Promise<TagOut> {
  return api.post(`/machines/${encodeURIComponent(machineId)}/tag-out`, { body: tagOut, schema: tagOutSchema });
}

export function useTagOutMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: tagOutMachine,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: machineKeys.states() }),
        queryClient.invalidateQueries({ queryKey: tagOutKeys.all }),
      ]),
  });
}
