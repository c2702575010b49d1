import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { isApiError } from '@/lib/api-client';
import { stationKeys } from '../api/get-station';

/**
 * When any call answers station_required, an admin revoked this screen's pairing: what the
 * screen knew about its station is dropped and asked again, and the 401 brings up pairing.
 */
export function useStationLost() {
  const queryClient = useQueryClient();

  useEffect(
    () =>
      queryClient.getMutationCache().subscribe((event) => {
        const error = event.type === 'updated' ? event.mutation.state.error : null;
        if (isApiError(error, 401) && error.code === 'station_required') {
          void queryClient.resetQueries({ queryKey: stationKeys.all });
        }
      }),
    [queryClient],
  );
}
