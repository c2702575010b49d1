import { userSchema, type InvitationAccept, type User } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitation-keys';

export function acceptInvitation(input: InvitationAccept): Promise<User> {
  return api.post('/invitations/accept', { body: input, schema: userSchema });
}

export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}
