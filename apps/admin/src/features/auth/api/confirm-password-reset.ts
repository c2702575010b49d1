import type { PasswordResetConfirm } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  return api.post('/auth/password-reset/confirm', { body: input });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
