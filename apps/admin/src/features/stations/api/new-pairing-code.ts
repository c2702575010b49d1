import { stationWithCodeSchema, type StationWithCode } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { stationKeys } from './station-keys';

/**
 * A fresh code for a station, to pair a replacement device. The device paired now keeps
 * working until the new code is used.
 */
export function newPairingCode(stationId: string): Promise<StationWithCode> {
  return api.post(`/stations/${encodeURIComponent(stationId)}/pairing-code`, { schema: stationWithCodeSchema });
}

export function useNewPairingCode() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: newPairingCode,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stationKeys.all }),
  });
}
