import type { PinInput } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export function setPin(input: PinInput): Promise<void> {
  return api.put('/profile/pin', { body: input });
}

export function useSetPin() {
  return useMutation({ mutationFn: setPin });
}
