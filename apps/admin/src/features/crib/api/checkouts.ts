import { cribCheckoutSchema, type CribCheckout } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

const cribCheckoutListSchema = z.array(cribCheckoutSchema);

/** `open`: the tools out now, soonest due first; otherwise the latest checkouts and takes, newest first. */
export function getCribCheckouts(open: boolean, signal?: AbortSignal): Promise<CribCheckout[]> {
  return api.get('/crib/checkouts', { query: { open: open ? 'true' : 'false' }, schema: cribCheckoutListSchema, signal });
}

export function cribCheckoutsQueryOptions(open: boolean) {
  return queryOptions({ queryKey: cribListKeys.checkouts(open), queryFn: ({ signal }) => getCribCheckouts(open, signal) });
}

export function useCribCheckouts(open: boolean, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...cribCheckoutsQueryOptions(open), enabled });
}
