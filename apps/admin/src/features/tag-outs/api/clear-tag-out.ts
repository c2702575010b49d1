import { clearedTagOutSchema, type ClearedTagOut, type TagOutClear } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from '../../machines/api/machine-keys';
import { tagOutKeys } from './tag-out-keys';

export interface ClearTagOutInput {
  machineId: string;
  clear: TagOutClear;
}

/** Puts the machine back in service, with a note of what was done. */
export function clearTagOut({ machineId, clear }: ClearTagOutInput): Promise<ClearedTagOut> {
  return api.post(`/machines/${encodeURIComponent(machineId)}/tag-out/clear`, { body: clear, schema: clearedTagOutSchema });
}

export function useClearTagOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: clearTagOut,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: tagOutKeys.all }),
        queryClient.invalidateQueries({ queryKey: machineKeys.states() }),
      ]),
  });
}
