import { reservationCheckedInSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

/** The holder claims their reservation here with the badge just scanned. */
export function checkInReservation({ reservationId, badge }: { reservationId: string; badge: string }) {
  return apiPost(`/station/reservations/${encodeURIComponent(reservationId)}/check-in`, { badge }, reservationCheckedInSchema);
}

export function useCheckInReservation() {
  return useMutation({ mutationFn: checkInReservation });
}
