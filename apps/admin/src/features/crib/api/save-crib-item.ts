import { cribItemSchema, type CribItem, type CribItemInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cribItemKeys } from './crib-item-keys';

export interface SaveCribItemInput {
  /** Absent for a new item. */
  id?: string | undefined;
  item: CribItemInput;
}

export function saveCribItem({ id, item }: SaveCribItemInput): Promise<CribItem> {
  return id
    ? api.put(`/crib/items/${encodeURIComponent(id)}`, { body: item, schema: cribItemSchema })
    : api.post('/crib/items', { body: item, schema: cribItemSchema });
}

export function useSaveCribItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveCribItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribItemKeys.all }),
  });
}
