import { stationWithCodeSchema, type StationCreate, type StationWithCode } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { stationKeys } from './station-keys';

/** The answer carries the pairing code; the server keeps only its hash, so this is the one chance to show it. */
export function createStation(input: StationCreate): Promise<StationWithCode> {
  return api.post('/stations', { body: input, schema: stationWithCodeSchema });
}

export function useCreateStation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stationKeys.all }),
  });
}
