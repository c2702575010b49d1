import { shopHoursSchema, type ShopHours, type WeeklyHoursInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

/** Replaces the whole weekly schedule; the answer is the hours as saved, in weekday order. */
export function updateShopHours(input: WeeklyHoursInput): Promise<ShopHours> {
  return api.put('/shop/hours', { body: input, schema: shopHoursSchema });
}

export function useUpdateShopHours() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShopHours,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shopKeys.hours() }),
  });
}
