import { signOffListSchema, type SignOff } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { signOffKeys } from './sign-off-keys';

export function getMemberSignOffs(memberId: string, signal?: AbortSignal): Promise<SignOff[]> {
  return api.get(`/members/${encodeURIComponent(memberId)}/sign-offs`, { schema: signOffListSchema, signal });
}

export function memberSignOffsQueryOptions(memberId: string) {
  return queryOptions({
    queryKey: signOffKeys.member(memberId),
    queryFn: ({ signal }) => getMemberSignOffs(memberId, signal),
  });
}

export function useMemberSignOffs(memberId: string) {
  return useQuery(memberSignOffsQueryOptions(memberId));
}
