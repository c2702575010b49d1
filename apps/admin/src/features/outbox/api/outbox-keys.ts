export interface OutboxListParams {
  page: number;
  pageSize: number;
}

export const outboxKeys = {
  all: ['outbox'] as const,
  lists: () => [...outboxKeys.all, 'list'] as const,
  list: (params: OutboxListParams) => [...outboxKeys.lists(), params] as const,
};
