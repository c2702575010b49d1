import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

/** The shop keeps its weekly hours on those days again. */
export function removeClosure(closureId: string): Promise<void> {
  return api.delete(`/shop/closures/${encodeURIComponent(closureId)}`);
}

export function useRemoveClosure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeClosure,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shopKeys.hours() }),
  });
}
