import { cribCheckoutSchema, type CribCheckout, type CribCheckoutInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

export function checkOut(input: CribCheckoutInput): Promise<CribCheckout> {
  return api.post('/crib/checkouts', { body: input, schema: cribCheckoutSchema });
}

export function useCheckOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: checkOut,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribListKeys.all }),
  });
}
