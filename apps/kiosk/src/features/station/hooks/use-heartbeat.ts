import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { isApiError } from '@/lib/api-client';
import { stationKeys } from '../api/get-station';
import { sendHeartbeat } from '../api/send-heartbeat';

export const HEARTBEAT_MS = 30_000;

/** Reports every 30 s; a 401 means the pairing was revoked, so the screen asks for a code again. */
export function useHeartbeat() {
  const queryClient = useQueryClient();

  useEffect(() => {
    const timer = setInterval(() => {
      sendHeartbeat().catch(async (error: unknown) => {
        if (isApiError(error, 401)) await queryClient.resetQueries({ queryKey: stationKeys.all });
      });
    }, HEARTBEAT_MS);
    return () => clearInterval(timer);
  }, [queryClient]);
}
