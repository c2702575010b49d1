import { availabilitySchema, type Availability } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

/** Others reserve all the time, so a week on screen is asked for again every minute. */
const REFRESH_MS = 60_000;

export function getAvailability(machineId: string, from: string, to: string, signal?: AbortSignal): Promise<Availability> {
  return api.get(`/machines/${encodeURIComponent(machineId)}/availability`, { query: { from, to }, schema: availabilitySchema, signal });
}

export function availabilityQueryOptions(machineId: string, from: string, to: string) {
  return queryOptions({
    queryKey: reservationKeys.availability(machineId, from, to),
    queryFn: ({ signal }) => getAvailability(machineId, from, to, signal),
    refetchInterval: REFRESH_MS,
    // Moving to the next week keeps the last one on screen until the new one arrives.
    placeholderData: keepPreviousData,
  });
}

export function useAvailability(machineId: string, from: string | undefined, to: string | undefined) {
  return useQuery({ ...availabilityQueryOptions(machineId, from ?? '', to ?? ''), enabled: Boolean(from && to) });
}
