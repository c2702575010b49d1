import { cribItemSchema, type CribItem } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, apiHref } from '../../../lib/api-client';
import { sendFile } from '../../../lib/upload-file';
import { cribItemKeys } from './crib-item-keys';

/** `version` changes after an upload, so the browser fetches the new picture instead of its copy. */
export function cribItemPhotoHref(itemId: string, version: number): string {
  return apiHref(`/crib/items/${encodeURIComponent(itemId)}/photo`, { v: version || undefined });
}

export interface UploadCribItemPhotoInput {
  itemId: string;
  photo: File;
  onProgress?: (fraction: number) => void;
}

export function uploadCribItemPhoto({ itemId, photo, onProgress }: UploadCribItemPhotoInput): Promise<CribItem> {
  return sendFile(`/crib/items/${encodeURIComponent(itemId)}/photo`, 'photo', photo, { method: 'PUT', schema: cribItemSchema, onProgress });
}

export function removeCribItemPhoto(itemId: string): Promise<void> {
  return api.delete(`/crib/items/${encodeURIComponent(itemId)}/photo`);
}

export function useUploadCribItemPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadCribItemPhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribItemKeys.all }),
  });
}

export function useRemoveCribItemPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeCribItemPhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: cribItemKeys.all }),
  });
}
