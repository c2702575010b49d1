import { stationMemberLookupResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

export function lookupMember(badge: string) {
  return apiPost('/station/members/lookup', { badge }, stationMemberLookupResultSchema);
}

export function useLookupMember() {
  return useMutation({ mutationFn: lookupMember });
}
