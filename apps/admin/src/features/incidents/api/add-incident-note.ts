import { incidentNoteSchema, type IncidentNote } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { incidentKeys } from './incident-keys';

export function addIncidentNote({ id, note }: { id: string; note: string }): Promise<IncidentNote> {
  return api.post(`/incidents/${encodeURIComponent(id)}/notes`, { body: { note }, schema: incidentNoteSchema });
}

export function useAddIncidentNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addIncidentNote,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: incidentKeys.all }),
  });
}
