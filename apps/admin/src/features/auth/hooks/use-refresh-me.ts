import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { authKeys } from '../api/auth-keys';

/** After a change elsewhere to the signed-in person's name or e-mail. */
export function useRefreshMe() {
  const queryClient = useQueryClient();
  return useCallback(() => queryClient.invalidateQueries({ queryKey: authKeys.all }), [queryClient]);
}
