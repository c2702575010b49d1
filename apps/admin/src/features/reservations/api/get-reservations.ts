import { reservationListSchema, type ReservationList } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationListQuery, type ReservationFilters } from '../utils/reservation-filters';
import { reservationKeys } from './reservation-keys';

export function getReservations(filters: ReservationFilters, timeZone: string, signal?: AbortSignal): Promise<ReservationList> {
  return api.get('/reservations', { query: reservationListQuery(filters, timeZone), schema: reservationListSchema, signal });
}

export function reservationsQueryOptions(filters: ReservationFilters, timeZone: string) {
  return queryOptions({
    queryKey: reservationKeys.list(filters, timeZone),
    queryFn: ({ signal }) => getReservations(filters, timeZone, signal),
    placeholderData: keepPreviousData,
  });
}

/** Waits for the shop's time zone: the filters' days mean nothing without it. */
export function useReservations(filters: ReservationFilters, timeZone: string | undefined) {
  return useQuery({ ...reservationsQueryOptions(filters, timeZone ?? 'UTC'), enabled: Boolean(timeZone) });
}
