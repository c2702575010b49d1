import { signOffSchema, type SignOff, type SignOffRevoke } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { signOffKeys } from './sign-off-keys';

export interface RevokeSignOffInput {
  id: string;
  revoke: SignOffRevoke;
}

export function revokeSignOff({ id, revoke }: RevokeSignOffInput): Promise<SignOff> {
  return api.post(`/sign-offs/${encodeURIComponent(id)}/revoke`, { body: revoke, schema: signOffSchema });
}

export function useRevokeSignOff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeSignOff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: signOffKeys.all }),
  });
}
