import { shopHoursSchema, type ShopHours } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

/** "Open now" turns into "closed" on the hour, so the answer is asked for again every few minutes. */
const REFRESH_MS = 5 * 60_000;

export function getShopHours(signal?: AbortSignal): Promise<ShopHours> {
  return api.get('/shop/hours', { schema: shopHoursSchema, signal });
}

export function shopHoursQueryOptions() {
  return queryOptions({
    queryKey: shopKeys.hours(),
    queryFn: ({ signal }) => getShopHours(signal),
    refetchInterval: REFRESH_MS,
  });
}

export function useShopHours() {
  return useQuery(shopHoursQueryOptions());
}
