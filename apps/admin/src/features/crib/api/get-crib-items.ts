import { cribItemSchema, type CribItem } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribItemKeys } from './crib-item-keys';

const cribItemListSchema = z.array(cribItemSchema);

/** Every item with every column: the admins' view of GET /api/crib/items. */
export function getCribItems(signal?: AbortSignal): Promise<CribItem[]> {
  return api.get('/crib/items', { schema: cribItemListSchema, signal });
}

export function cribItemsQueryOptions() {
  return queryOptions({
    queryKey: cribItemKeys.list(),
    queryFn: ({ signal }) => getCribItems(signal),
  });
}

export function useCribItems() {
  return useQuery(cribItemsQueryOptions());
}
