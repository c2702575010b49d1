import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { reservationKeys } from './reservation-keys';

/** The time goes back to everyone; the server also mails the member a cancellation. */
export function cancelReservation(reservationId: string): Promise<void> {
  return api.delete(`/reservations/${encodeURIComponent(reservationId)}`);
}

export function useCancelReservation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelReservation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reservationKeys.all }),
  });
}
