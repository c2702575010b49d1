import { signOffSchema, type SignOff, type SignOffCreate } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { signOffKeys } from './sign-off-keys';

export function createSignOff(input: SignOffCreate): Promise<SignOff> {
  return api.post('/sign-offs', { body: input, schema: signOffSchema });
}

export function useCreateSignOff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSignOff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: signOffKeys.all }),
  });
}
