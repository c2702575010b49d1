import { memberSchema, type Member, type MemberUpdate } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

export interface UpdateMemberInput {
  id: string;
  changes: MemberUpdate;
}

export function updateMember({ id, changes }: UpdateMemberInput): Promise<Member> {
  return api.patch(`/members/${encodeURIComponent(id)}`, { body: changes, schema: memberSchema });
}

export function useUpdateMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.all }),
  });
}
