import { incidentSchema, type Incident, type IncidentReport } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { incidentKeys } from './incident-keys';

export interface ReportIncidentInput {
  report: IncidentReport;
  photos: readonly File[];
  onProgress?: (fraction: number) => void;
}

/** The fields and the photos go in one multipart request: the server keeps all of it or none. */
export function reportIncident({ report, photos, onProgress }: ReportIncidentInput): Promise<Incident> {
  const body = new FormData();
  for (const [key, value] of Object.entries(report)) {
    if (typeof value === 'string') body.append(key, value);
  }
  for (const photo of photos) body.append('photos', photo);
  return api.upload('/incidents', { body, schema: incidentSchema, onProgress });
}

export function useReportIncident() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reportIncident,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: incidentKeys.all }),
  });
}
