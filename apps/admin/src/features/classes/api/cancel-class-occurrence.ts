import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

/** One meeting is called off; the others stay, and its time goes back to the members. */
export function cancelClassOccurrence(classId: string, reservationId: string): Promise<void> {
  return api.delete(`/classes/${encodeURIComponent(classId)}/occurrences/${encodeURIComponent(reservationId)}`);
}

export function useCancelClassOccurrence(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reservationId: string) => cancelClassOccurrence(classId, reservationId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }),
  });
}
