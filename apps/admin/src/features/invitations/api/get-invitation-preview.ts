import { invitationPreviewSchema, type InvitationPreview } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitation-keys';

export function getInvitationPreview(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get(`/invitations/${encodeURIComponent(token)}`, { schema: invitationPreviewSchema, signal });
}

export function invitationPreviewQueryOptions(token: string) {
  return queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: ({ signal }) => getInvitationPreview(token, signal),
    staleTime: Infinity,
  });
}

export function useInvitationPreview(token: string) {
  return useQuery(invitationPreviewQueryOptions(token));
}
