import { cribStationMemberResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

export function lookupCribMember(badge: string) {
  return apiPost('/station/crib/member', { badge }, cribStationMemberResultSchema);
}

export function useLookupCribMember() {
  return useMutation({ mutationFn: lookupCribMember });
}
