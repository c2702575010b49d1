import { stationDutyResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

/** Toggles the instructor or admin on or off duty for the whole shop. */
export function setDuty(input: { badge: string; pin: string }) {
  return apiPost('/station/duty', input, stationDutyResultSchema);
}

export function useSetDuty() {
  return useMutation({ mutationFn: setDuty });
}
