import { badgeSchema, type Badge } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { badgeKeys } from './badge-keys';

/** The member's active badge; the server issues the first one when it is first asked for. */
export function getBadge(memberId: string, signal?: AbortSignal): Promise<Badge> {
  return api.get(`/members/${encodeURIComponent(memberId)}/badge`, { schema: badgeSchema, signal });
}

export function badgeQueryOptions(memberId: string) {
  return queryOptions({
    queryKey: badgeKeys.member(memberId),
    queryFn: ({ signal }) => getBadge(memberId, signal),
  });
}

export function useBadge(memberId: string) {
  return useQuery(badgeQueryOptions(memberId));
}
