import { userSchema, type LoginInput, type User } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

export function signIn(input: LoginInput): Promise<User> {
  return api.post('/auth/login', { body: input, schema: userSchema });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
