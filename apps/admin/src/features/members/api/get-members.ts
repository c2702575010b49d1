import { memberPageSchema, type MemberListQuery, type MemberPage } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { memberKeys } from './member-keys';

export function getMembers(filters: MemberListQuery, signal?: AbortSignal): Promise<MemberPage> {
  return api.get('/members', { query: { ...filters }, schema: memberPageSchema, signal });
}

export function membersQueryOptions(filters: MemberListQuery) {
  return queryOptions({
    queryKey: memberKeys.list(filters),
    queryFn: ({ signal }) => getMembers(filters, signal),
    // The last page stays on screen while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });
}

export function useMembers(filters: MemberListQuery) {
  return useQuery(membersQueryOptions(filters));
}
