import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { watchLiveLink, type LinkStatus, type LiveHint } from '@chuckkey/core';
import { createLiveSocket } from '@/lib/socket';

interface LiveLinkOptions {
  /** Only a paired device (or a signed-in person) may open the link; until then it stays shut. */
  enabled: boolean;
  /** Invalidate what the change touches; events are hints, the screen refetches. */
  onHint: (hint: LiveHint) => void;
}

/** The screen's live link to the server, for as long as it is enabled, and how it is doing. */
export function useLiveLink({ enabled, onHint }: LiveLinkOptions): LinkStatus {
  const queryClient = useQueryClient();
  const [status, setStatus] = useState<LinkStatus>('connecting');
  const hint = useRef(onHint);

  useEffect(() => {
    hint.current = onHint;
  }, [onHint]);

  useEffect(() => {
    if (!enabled) return;
    return watchLiveLink(createLiveSocket(), {
      status: setStatus,
      hint: (event) => hint.current(event),
      resync: () => void queryClient.invalidateQueries(),
      // A refused link means the pairing is gone: refetching shows the pairing screen.
      refused: () => void queryClient.invalidateQueries(),
    });
  }, [enabled, queryClient]);

  return status;
}
