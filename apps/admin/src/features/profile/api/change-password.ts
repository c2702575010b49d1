import type { PasswordChange } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function changePassword(input: PasswordChange): Promise<void> {
  return api.post('/profile/password', { body: input });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
