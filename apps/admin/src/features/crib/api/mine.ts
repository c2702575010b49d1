import { cribCheckoutSchema, type CribCheckout } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

const cribCheckoutListSchema = z.array(cribCheckoutSchema);

/** The tools the signed-in member has out, soonest due first. */
export function getMyCribCheckouts(signal?: AbortSignal): Promise<CribCheckout[]> {
  return api.get('/crib/mine', { schema: cribCheckoutListSchema, signal });
}

export function myCribCheckoutsQueryOptions() {
  return queryOptions({ queryKey: cribListKeys.mine(), queryFn: ({ signal }) => getMyCribCheckouts(signal) });
}

export function useMyCribCheckouts() {
  return useQuery(myCribCheckoutsQueryOptions());
}
