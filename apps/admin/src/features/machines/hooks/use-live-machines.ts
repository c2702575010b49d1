import type { LiveHint } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useLiveLink } from '../../../hooks/use-live-link';
import { machineKeys } from '../api/machine-keys';

/** Keeps the machines' states current: each change on the floor refetches what shows it. */
export function useLiveMachines() {
  const queryClient = useQueryClient();
  const onHint = useCallback(
    (hint: LiveHint) => {
      void queryClient.invalidateQueries({ queryKey: machineKeys.states() });
      if (hint.type === 'machine') void queryClient.invalidateQueries({ queryKey: machineKeys.detail(hint.update.machineId) });
    },
    [queryClient],
  );
  return useLiveLink(onHint);
}
