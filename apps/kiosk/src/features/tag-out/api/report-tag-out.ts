import { stationTagOutResultSchema, type StationTagOut } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { stationStateKey } from '../../station/api/get-station-state';

/** Tags the station's machine out; without a badge the running session's member reports it. */
export function reportTagOut(input: StationTagOut) {
  return apiPost('/station/tag-out', input, stationTagOutResultSchema);
}

export function useReportTagOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reportTagOut,
    // The station's state carries the tag-out (and the ended session): the plate changes at once.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stationStateKey() }),
  });
}
