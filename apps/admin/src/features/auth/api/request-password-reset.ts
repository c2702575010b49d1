import type { PasswordResetRequest } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function requestPasswordReset(input: PasswordResetRequest): Promise<void> {
  return api.post('/auth/password-reset', { body: input });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
