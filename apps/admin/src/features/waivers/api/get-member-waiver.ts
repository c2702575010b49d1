import { waiverStatusSchema, type WaiverStatus } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { waiverKeys } from './waiver-keys';

export function getMemberWaiver(memberId: string, signal?: AbortSignal): Promise<WaiverStatus> {
  return api.get(`/members/${encodeURIComponent(memberId)}/waiver`, { schema: waiverStatusSchema, signal });
}

export function memberWaiverQueryOptions(memberId: string) {
  return queryOptions({
    queryKey: waiverKeys.member(memberId),
    queryFn: ({ signal }) => getMemberWaiver(memberId, signal),
  });
}

export function useMemberWaiver(memberId: string) {
  return useQuery(memberWaiverQueryOptions(memberId));
}
