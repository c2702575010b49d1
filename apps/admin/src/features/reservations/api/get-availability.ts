import { availabilitySchema, takenRangeSchema } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

/** A class hold may name its class (`title`); a claim of a member never names anyone. */
const weekAvailabilitySchema = availabilitySchema.extend({
  taken: z.array(takenRangeSchema.extend({ title: z.string().nullish() })),
});
export type WeekAvailability = z.infer<typeof weekAvailabilitySchema>;

/** Others reserve all the time, so a week on screen is asked for again every minute. */
const REFRESH_MS = 60_000;

export function getAvailability(machineId: string, from: string, to: string, signal?: AbortSignal): Promise<WeekAvailability> {
  return api.get(`/machines/${encodeURIComponent(machineId)}/availability`, { query: { from, to }, schema: weekAvailabilitySchema, signal });
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
