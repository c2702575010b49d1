import { cribOverdueSchema, type CribOverdue } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { cribListKeys } from './crib-list-keys';

const cribOverdueListSchema = z.array(cribOverdueSchema);

/** Tools past their due time, most overdue first, with the reminders their members were sent. */
export function getCribOverdue(signal?: AbortSignal): Promise<CribOverdue[]> {
  return api.get('/crib/overdue', { schema: cribOverdueListSchema, signal });
}

export function cribOverdueQueryOptions() {
  return queryOptions({ queryKey: cribListKeys.overdue(), queryFn: ({ signal }) => getCribOverdue(signal) });
}

export function useCribOverdue() {
  return useQuery(cribOverdueQueryOptions());
}
