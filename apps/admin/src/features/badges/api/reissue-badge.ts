import { badgeSchema, type Badge } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { badgeKeys } from './badge-keys';

/** A lost card: a new code, and the old one stops working at once. */
export function reissueBadge(memberId: string): Promise<Badge> {
  return api.post(`/members/${encodeURIComponent(memberId)}/badge`, { schema: badgeSchema });
}

export function useReissueBadge() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reissueBadge,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: badgeKeys.all }),
  });
}
