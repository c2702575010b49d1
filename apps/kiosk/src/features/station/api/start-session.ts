import { sessionStartedSchema, type SessionStart } from '@chuckkey/core';
import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';

/** Starts only with the server's answer: the station never starts a session on its own. */
export function startSession(input: SessionStart) {
  return apiPost('/station/sessions', input, sessionStartedSchema);
}

export function useStartSession() {
  return useMutation({ mutationFn: startSession });
}
