import { profileSchema, type Profile, type ProfileUpdate } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { profileKeys } from './profile-keys';

export function updateProfile(input: ProfileUpdate): Promise<Profile> {
  return api.put('/profile', { body: input, schema: profileSchema });
}

export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProfile,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: profileKeys.all }),
  });
}
