import { stationSchema, type Station } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { stationKeys } from './station-keys';

/** The device's credential is forgotten at once: its next request is refused. */
export function revokeStation(stationId: string): Promise<Station> {
  return api.post(`/stations/${encodeURIComponent(stationId)}/revoke`, { schema: stationSchema });
}

export function useRevokeStation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeStation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stationKeys.all }),
  });
}
