import { reservationSchema, type Reservation } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

export interface ReservationRequestBody {
  machineId: string;
  start: string;
  end: string;
}

export function createReservation(body: ReservationRequestBody): Promise<Reservation> {
  return api.post('/reservations', { body, schema: reservationSchema });
}

export function useCreateReservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createReservation,
    // A refusal may mean someone else just took the slot, so the week is asked for again either way.
    onSettled: () => queryClient.invalidateQueries({ queryKey: reservationKeys.all }),
  });
}
