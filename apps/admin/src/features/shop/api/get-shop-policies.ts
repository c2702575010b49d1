import { shopPoliciesSchema, type ShopPolicies } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

export function getShopPolicies(signal?: AbortSignal): Promise<ShopPolicies> {
  return api.get('/shop/policies', { schema: shopPoliciesSchema, signal });
}

export function shopPoliciesQueryOptions() {
  return queryOptions({ queryKey: shopKeys.policies(), queryFn: ({ signal }) => getShopPolicies(signal) });
}

export function useShopPolicies() {
  return useQuery(shopPoliciesQueryOptions());
}
