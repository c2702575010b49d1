import { cribCheckoutSchema, type CribCheckout, type CribReturnInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

export interface ReturnCheckoutInput {
  id: string;
  ret: CribReturnInput;
}

export function returnCheckout({ id, ret }: ReturnCheckoutInput): Promise<CribCheckout> {
  return api.post(`/crib/checkouts/${encodeURIComponent(id)}/return`, { body: ret, schema: cribCheckoutSchema });
}

export function useReturnCheckout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: returnCheckout,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribListKeys.all }),
  });
}
