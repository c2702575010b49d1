import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { apiPost } from '@/lib/api-client';
import { stationStateKey } from '../api/get-station-state';
import { endNow, flushPendingEnds, readPendingEnds, type EndOutcome, type PendingEnd } from '../utils/end-queue';

// The contract: an end kept offline is tried again every 10 seconds until the server answers.
export const END_RETRY_MS = 10_000;

const client = { post: apiPost };

/** Ends sessions, keeping an end pressed offline on this device until the server has it. */
export function useEndQueue() {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState<PendingEnd[]>(() => readPendingEnds(localStorage));
  const flushing = useRef(false);

  const flush = useCallback(async () => {
    if (flushing.current) return;
    flushing.current = true;
    try {
      const result = await flushPendingEnds(client, localStorage);
      setPending(result.kept);
      if (result.answered.length) await queryClient.invalidateQueries({ queryKey: stationStateKey() });
    } finally {
      flushing.current = false;
    }
  }, [queryClient]);

  const hasPending = pending.length > 0;
  useEffect(() => {
    if (!hasPending) return;
    void flush();
    const timer = setInterval(() => void flush(), END_RETRY_MS);
    return () => clearInterval(timer);
  }, [hasPending, flush]);

  const end = useCallback(
    async (sessionId: string, badge?: string): Promise<EndOutcome> => {
      const outcome = await endNow(client, localStorage, { sessionId, badge, idempotencyKey: crypto.randomUUID(), pressedAt: new Date() });
      setPending(readPendingEnds(localStorage));
      if (outcome.kind === 'ended') await queryClient.invalidateQueries({ queryKey: stationStateKey() });
      return outcome;
    },
    [queryClient],
  );

  return { pending, end };
}
