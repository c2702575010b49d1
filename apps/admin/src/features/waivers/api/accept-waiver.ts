import { waiverStatusSchema, type WaiverAccept, type WaiverStatus } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { waiverKeys } from './waiver-keys';

export function acceptWaiver(input: WaiverAccept): Promise<WaiverStatus> {
  return api.post('/waivers/accept', { body: input, schema: waiverStatusSchema });
}

export function useAcceptWaiver() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptWaiver,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: waiverKeys.all }),
    // A newer version published meanwhile shows up on the page instead of the old text.
    onError: () => queryClient.invalidateQueries({ queryKey: waiverKeys.all }),
  });
}
