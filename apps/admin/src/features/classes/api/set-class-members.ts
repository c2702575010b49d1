import { classSchema, type ClassDetail } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

/** The whole list goes each time: adding or removing one member sends everyone who stays. */
export function setClassMembers(classId: string, memberIds: readonly string[]): Promise<ClassDetail> {
  return api.put(`/classes/${encodeURIComponent(classId)}/members`, { body: { memberIds }, schema: classSchema });
}

export function useSetClassMembers(classId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (memberIds: readonly string[]) => setClassMembers(classId, memberIds),
    onSuccess: async (updated) => {
      queryClient.setQueryData(classKeys.detail(classId), updated);
      await queryClient.invalidateQueries({ queryKey: classKeys.all });
    },
  });
}
