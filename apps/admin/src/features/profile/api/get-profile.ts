import { profileSchema, type Profile } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { profileKeys } from './profile-keys';

export function getProfile(signal?: AbortSignal): Promise<Profile> {
  return api.get('/profile', { schema: profileSchema, signal });
}

export function profileQueryOptions() {
  return queryOptions({
    queryKey: profileKeys.own(),
    queryFn: ({ signal }) => getProfile(signal),
  });
}

export function useProfile() {
  return useQuery(profileQueryOptions());
}
