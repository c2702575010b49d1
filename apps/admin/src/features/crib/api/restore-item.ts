import { cribItemSchema, type CribItem, type CribRestoreInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

export interface RestoreItemInput {
  id: string;
  restore: CribRestoreInput;
}

/** Back in circulation: the tool is good again and can be lent. */
export function restoreItem({ id, restore }: RestoreItemInput): Promise<CribItem> {
  return api.post(`/crib/items/${encodeURIComponent(id)}/restore`, { body: restore, schema: cribItemSchema });
}

export function useRestoreItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribListKeys.all }),
  });
}
