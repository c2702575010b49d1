import { boardSchema } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiGet, isApiError } from '@/lib/api-client';

export const boardKeys = {
  all: ['board'] as const,
  detail: () => [...boardKeys.all, 'detail'] as const,
};

// Live events are hints and may be missed; a look every minute puts anything missed right, and
// moves "Open now" to "Closed now" at closing time without any event.
const BOARD_REFRESH_MS = 60_000;

export function getBoard(signal?: AbortSignal) {
  return apiGet('/board', boardSchema, signal);
}

export const boardQueryOptions = () =>
  queryOptions({
    queryKey: boardKeys.detail(),
    queryFn: ({ signal }) => getBoard(signal),
    // 401 is an answer, not a failure: this screen is not paired as a device (or no longer is).
    retry: (_count, error) => !isApiError(error, 401),
    refetchInterval: BOARD_REFRESH_MS,
    refetchIntervalInBackground: true,
  });

export function useBoard() {
  return useQuery(boardQueryOptions());
}
