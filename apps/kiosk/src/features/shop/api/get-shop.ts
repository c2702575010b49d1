import { shopSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '@/lib/api-client';

export const shopKeys = {
  all: ['shop'] as const,
  detail: () => [...shopKeys.all, 'detail'] as const,
};

export function getShop(signal?: AbortSignal) {
  return apiGet('/shop', shopSchema, signal);
}

export const shopQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.detail(),
    queryFn: ({ signal }) => getShop(signal),
    // The name and time zone change once in a blue moon; an hourly look keeps a wall screen current.
    staleTime: 60 * 60 * 1_000,
    refetchInterval: 60 * 60 * 1_000,
  });

export function useShop() {
  return useQuery(shopQueryOptions());
}
