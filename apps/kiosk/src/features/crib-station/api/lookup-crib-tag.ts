import { cribTagLookupResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

export function lookupCribTag(tag: string) {
  return apiPost('/station/crib/items/lookup', { tag }, cribTagLookupResultSchema);
}

export function useLookupCribTag() {
  return useMutation({ mutationFn: lookupCribTag });
}
