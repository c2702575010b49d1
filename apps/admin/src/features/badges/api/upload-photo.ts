import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { badgeKeys } from './badge-keys';

export interface UploadPhotoInput {
  memberId: string;
  photo: File;
  onProgress?: (fraction: number) => void;
}

export function uploadPhoto({ memberId, photo, onProgress }: UploadPhotoInput): Promise<void> {
  const body = new FormData();
  body.append('photo', photo);
  return api.upload(`/members/${encodeURIComponent(memberId)}/photo`, { method: 'PUT', body, onProgress });
}

export function useUploadPhoto() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPhoto,
    // The printed card carries the photo, so whatever shows the badge is out of date too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: badgeKeys.all }),
  });
}
