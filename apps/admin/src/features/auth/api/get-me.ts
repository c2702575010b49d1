import { userSchema, type User } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { ApiError, api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

/** Signed out is an answer, not a failure: it resolves to null. */
export async function getMe(signal?: AbortSignal): Promise<User | null> {
  try {
    return await api.get('/auth/me', { schema: userSchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
