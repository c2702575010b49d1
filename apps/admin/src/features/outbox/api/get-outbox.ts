import { outboxListSchema, type OutboxMessage } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { outboxKeys, type OutboxListParams } from './outbox-keys';

export interface OutboxPage {
  items: OutboxMessage[];
  total: number;
}

function newestFirst(a: OutboxMessage, b: OutboxMessage): number {
  return Date.parse(b.receivedAt) - Date.parse(a.receivedAt);
}

export async function getOutbox(params: OutboxListParams, signal?: AbortSignal): Promise<OutboxPage> {
  const { items, total } = await api.get('/outbox', { query: { ...params }, schema: outboxListSchema, signal });
  return { items: [...items].sort(newestFirst), total };
}

export function outboxQueryOptions(params: OutboxListParams) {
  return queryOptions({
    queryKey: outboxKeys.list(params),
    queryFn: ({ signal }) => getOutbox(params, signal),
    placeholderData: keepPreviousData,
  });
}

export function useOutbox(params: OutboxListParams) {
  return useQuery(outboxQueryOptions(params));
}
