import { waiverStatusSchema, type WaiverStatus } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiHref } from '../../../lib/api-client';
import { sendFile } from '../../../lib/upload-file';
import { waiverKeys } from './waiver-keys';

export interface UploadWaiverScanInput {
  memberId: string;
  scan: File;
  onProgress?: (fraction: number) => void;
}

export function uploadWaiverScan({ memberId, scan, onProgress }: UploadWaiverScanInput): Promise<WaiverStatus> {
  return sendFile(`/members/${encodeURIComponent(memberId)}/waiver-scan`, 'scan', scan, { schema: waiverStatusSchema, onProgress });
}

export function waiverScanHref(memberId: string): string {
  return apiHref(`/members/${encodeURIComponent(memberId)}/waiver-scan`);
}

export function useUploadWaiverScan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadWaiverScan,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: waiverKeys.all }),
  });
}
