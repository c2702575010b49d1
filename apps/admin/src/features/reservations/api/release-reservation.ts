import { reservationSchema, type Reservation } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

/** The holder is done early: the rest of their checked-in reservation goes back to everyone. */
export function releaseReservation(reservationId: string): Promise<Reservation> {
  return api.post(`/reservations/${encodeURIComponent(reservationId)}/release`, { schema: reservationSchema });
}

export function useReleaseReservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: releaseReservation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reservationKeys.all }),
  });
}
