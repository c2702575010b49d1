import { cribCheckoutSchema, type CribStationReturnInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { cribStationKeys } from './get-crib-consumables';

export function returnCribTool(input: CribStationReturnInput) {
  return apiPost('/station/crib/returns', input, cribCheckoutSchema);
}

export function useReturnCribTool() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: returnCribTool,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribStationKeys.all }),
  });
}
