import { stationScanResultSchema } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

/** Every badge scanned at idle goes here: the server decides, the station shows the decision. */
export function scanBadge(badge: string) {
  return apiPost('/station/scan', { badge }, stationScanResultSchema);
}

export function useScanBadge() {
  return useMutation({ mutationFn: scanBadge });
}
