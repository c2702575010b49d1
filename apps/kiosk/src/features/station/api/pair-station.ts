import { stationSelfSchema } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { stationKeys } from './get-station';

export function pairStation(pairingCode: string) {
  return apiPost('/station/pair', { pairingCode }, stationSelfSchema);
}

export function usePairStation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: pairStation,
    onSuccess: async (station) => {
      queryClient.setQueryData(stationKeys.self(), station);
      // The device is someone new to the server now: whatever it asked before (a board's 401
      // included) is asked again.
      await queryClient.invalidateQueries();
    },
  });
}
