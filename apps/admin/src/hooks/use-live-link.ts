import { watchLiveLink, type LinkStatus, type LiveHint } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { createLiveSocket } from '../lib/socket';

/** The page's live link to the server while it is mounted, and how it is doing. */
export function useLiveLink(onHint: (hint: LiveHint) => void): LinkStatus {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<LinkStatus>('connecting');
  const hint = useRef(onHint);

  useEffect(() => {
    hint.current = onHint;
  }, [onHint]);

  useEffect(
    () =>
      watchLiveLink(createLiveSocket(), {
        status: setStatus,
        hint: (event) => hint.current(event),
        resync: () => void queryClient.invalidateQueries(),
        // Refused: the sign-in has ended. Refetching lets the signed-in layout notice and ask again.
        refused: () => void queryClient.invalidateQueries(),
      }),
    [queryClient],
  );

  return status;
}
