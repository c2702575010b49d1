import { shopClosureSchema, type ClosureInput, type ShopClosure } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './shop-keys';

export function addClosure(input: ClosureInput): Promise<ShopClosure> {
  return api.post('/shop/closures', { body: input, schema: shopClosureSchema });
}

export function useAddClosure() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addClosure,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shopKeys.hours() }),
  });
}
