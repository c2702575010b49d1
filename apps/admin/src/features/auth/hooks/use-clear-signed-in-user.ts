import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { authKeys } from '../api/auth-keys';

/** What a 401 from any call means: the web session is gone, so the guard sends the person to sign in. */
export function useClearSignedInUser() {
  const queryClient = useQueryClient();
  return useCallback(() => queryClient.setQueryData(authKeys.me(), null), [queryClient]);
}
