import { waiverVersionSchema, type WaiverVersion } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError, api } from '../../../lib/api-client';
import { waiverKeys } from './waiver-keys';

/** A shop that has not published a waiver yet is an answer, not a failure: it resolves to null. */
export async function getCurrentWaiver(signal?: AbortSignal): Promise<WaiverVersion | null> {
  try {
    return await api.get('/waivers/current', { schema: waiverVersionSchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  }
}

export function currentWaiverQueryOptions() {
  return queryOptions({
    queryKey: waiverKeys.current(),
    queryFn: ({ signal }) => getCurrentWaiver(signal),
  });
}

export function useCurrentWaiver() {
  return useQuery(currentWaiverQueryOptions());
}
