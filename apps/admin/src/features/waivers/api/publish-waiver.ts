import { waiverVersionSchema, type WaiverPublish, type WaiverVersion } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { waiverKeys } from './waiver-keys';

export function publishWaiver(input: WaiverPublish): Promise<WaiverVersion> {
  return api.post('/waivers', { body: input, schema: waiverVersionSchema });
}

export function usePublishWaiver() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishWaiver,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: waiverKeys.all }),
  });
}
