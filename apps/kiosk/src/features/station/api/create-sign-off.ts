import { signOffSchema, type StationSignOff } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

export function createSignOff(input: StationSignOff) {
  return apiPost('/station/sign-offs', input, signOffSchema);
}

export function useCreateSignOff() {
  return useMutation({ mutationFn: createSignOff });
}
