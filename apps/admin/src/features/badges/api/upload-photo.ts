import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sendFile } from '../../../lib/upload-file';
import { badgeKeys } from './badge-keys';

export interface UploadPhotoInput {
  memberId: string;
  photo: File;
  onProgress?: (fraction: number) => void;
}

export function uploadPhoto({ memberId, photo, onProgress }: UploadPhotoInput): Promise<void> {
  return sendFile(`/members/${encodeURIComponent(memberId)}/photo`, 'photo', photo, { method: 'PUT', onProgress });
}

export function useUploadPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    // The printed card carries the photo, so whatever shows the badge is out of date too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: badgeKeys.all }),
  });
}
