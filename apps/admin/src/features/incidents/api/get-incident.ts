import { incidentSchema, type Incident } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, apiHref } from '../../../lib/api-client';
import { incidentKeys } from './incident-keys';

export function getIncident(id: string, signal?: AbortSignal): Promise<Incident> {
  return api.get(`/incidents/${encodeURIComponent(id)}`, { schema: incidentSchema, signal });
}

export function incidentQueryOptions(id: string) {
  return queryOptions({
    queryKey: incidentKeys.detail(id),
    queryFn: ({ signal }) => getIncident(id, signal),
  });
}

export function useIncident(id: string) {
  return useQuery(incidentQueryOptions(id));
}

/** A report's photo by its number (1–5); stored photos never change, so the address stays good. */
export function incidentPhotoHref(id: string, n: number): string {
  return apiHref(`/incidents/${encodeURIComponent(id)}/photos/${n}`);
}
