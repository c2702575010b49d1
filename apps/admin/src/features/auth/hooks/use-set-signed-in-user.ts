import type { User } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { authKeys } from '../api/auth-keys';

/** For flows outside this feature that end signed in, such as accepting an invitation. */
export function useSetSignedInUser() {
  const queryClient = useQueryClient();
  return useCallback((user: User) => queryClient.setQueryData(authKeys.me(), user), [queryClient]);
}
