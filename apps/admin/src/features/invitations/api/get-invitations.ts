import { invitationSchema, type Invitation } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitation-keys';

const invitationListSchema = z.object({ items: z.array(invitationSchema) });

export async function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  const { items } = await api.get('/invitations', { schema: invitationListSchema, signal });
  return items;
}

export function invitationsQueryOptions() {
  return queryOptions({
    queryKey: invitationKeys.list(),
    queryFn: ({ signal }) => getInvitations(signal),
  });
}

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}
