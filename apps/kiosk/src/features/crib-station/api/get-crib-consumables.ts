import { cribStationConsumablesSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet } from '@/lib/api-client';

export const cribStationKeys = {
  all: ['crib-station'] as const,
  consumables: () => [...cribStationKeys.all, 'consumables'] as const,
};

export function getCribConsumables(signal?: AbortSignal) {
  return apiGet('/station/crib/consumables', cribStationConsumablesSchema, signal);
}

export const cribConsumablesQueryOptions = () =>
  queryOptions({
    queryKey: cribStationKeys.consumables(),
    queryFn: ({ signal }) => getCribConsumables(signal),
    // The counts change with every take, at this station and others: read afresh each time the list opens.
    staleTime: 0,
  });

export function useCribConsumables() {
  return useQuery(cribConsumablesQueryOptions());
}
