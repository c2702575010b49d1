import { shopPoliciesSchema, type ShopPolicies } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

/** Replaces the shop's policies; the answer is what the server kept. */
export function updateShopPolicies(input: ShopPolicies): Promise<ShopPolicies> {
  return api.put('/shop/policies', { body: input, schema: shopPoliciesSchema });
}

export function useUpdateShopPolicies() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShopPolicies,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shopKeys.policies() }),
  });
}
