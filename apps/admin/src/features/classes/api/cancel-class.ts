import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

/** Every meeting still to come is cancelled and its time goes back to the members. */
export function cancelClass(classId: string): Promise<void> {
  return api.delete(`/classes/${encodeURIComponent(classId)}`);
}

export function useCancelClass(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelClass(classId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }),
  });
}
