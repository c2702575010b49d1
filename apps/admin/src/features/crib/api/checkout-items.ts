import { cribItemSchema, type CribItem } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

const cribItemListSchema = z.array(cribItemSchema);

/** Every item with every column, as admins see them: the check-out form offers the available ones. */
export function getCheckoutItems(signal?: AbortSignal): Promise<CribItem[]> {
  return api.get('/crib/items', { schema: cribItemListSchema, signal });
}

export function checkoutItemsQueryOptions() {
  return queryOptions({ queryKey: cribListKeys.checkoutItems(), queryFn: ({ signal }) => getCheckoutItems(signal) });
}

export function useCheckoutItems() {
  return useQuery(checkoutItemsQueryOptions());
}
