import { myReservationsSchema, type MyReservations } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

export function getMyReservations(signal?: AbortSignal): Promise<MyReservations> {
  return api.get('/reservations/mine', { schema: myReservationsSchema, signal });
}

export function myReservationsQueryOptions() {
  return queryOptions({ queryKey: reservationKeys.mine(), queryFn: ({ signal }) => getMyReservations(signal) });
}

export function useMyReservations() {
  return useQuery(myReservationsQueryOptions());
}
