import { cribAttentionSchema, type CribAttention } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

const cribAttentionListSchema = z.array(cribAttentionSchema);

/** Tools out of circulation because they came back needing attention or damaged. */
export function getCribAttention(signal?: AbortSignal): Promise<CribAttention[]> {
  return api.get('/crib/attention', { schema: cribAttentionListSchema, signal });
}

export function cribAttentionQueryOptions() {
  return queryOptions({ queryKey: cribListKeys.attention(), queryFn: ({ signal }) => getCribAttention(signal) });
}

export function useCribAttention() {
  return useQuery(cribAttentionQueryOptions());
}
