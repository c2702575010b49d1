import { incidentSchema, type Incident, type IncidentStatus } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { incidentKeys } from './incident-keys';

export function updateIncidentStatus({ id, status }: { id: string; status: IncidentStatus }): Promise<Incident> {
  return api.patch(`/incidents/${encodeURIComponent(id)}`, { body: { status }, schema: incidentSchema });
}

export function useUpdateIncidentStatus() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateIncidentStatus,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: incidentKeys.all }),
  });
}
