import { invitationSchema, type Invitation, type InvitationCreate } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitation-keys';

export function createInvitation(input: InvitationCreate): Promise<Invitation> {
  return api.post('/invitations', { body: input, schema: invitationSchema });
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}
