import { cribStationCheckoutResultSchema, type CribStationCheckoutInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { cribStationKeys } from './get-crib-consumables';

export function checkOutBasket(input: CribStationCheckoutInput) {
  return apiPost('/station/crib/checkouts', input, cribStationCheckoutResultSchema);
}

export function useCheckOutBasket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: checkOutBasket,
    // A refused basket may mean the counts moved too, so the list is read again either way.
    onSettled: () => queryClient.invalidateQueries({ queryKey: cribStationKeys.all }),
  });
}
