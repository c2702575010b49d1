import { shopSchema, type Shop } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

export function getShop(signal?: AbortSignal): Promise<Shop> {
  return api.get('/shop', { schema: shopSchema, signal });
}

export function shopQueryOptions() {
  return queryOptions({
    queryKey: shopKeys.detail(),
    queryFn: ({ signal }) => getShop(signal),
    // The shop's name and time zone change about once a decade.
    staleTime: 60 * 60_000,
  });
}

export function useShop() {
  return useQuery(shopQueryOptions());
}
