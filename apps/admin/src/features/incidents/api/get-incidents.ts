import { incidentListSchema, type IncidentListQuery, type IncidentSummary } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { incidentKeys } from './incident-keys';

export async function getIncidents(filters: IncidentListQuery, signal?: AbortSignal): Promise<IncidentSummary[]> {
  const answer = await api.get('/incidents', { query: { status: filters.status, kind: filters.kind }, schema: incidentListSchema, signal });
  return answer.items;
}

export function incidentsQueryOptions(filters: IncidentListQuery) {
  return queryOptions({
    queryKey: incidentKeys.list(filters),
    queryFn: ({ signal }) => getIncidents(filters, signal),
    placeholderData: keepPreviousData,
  });
}

export function useIncidents(filters: IncidentListQuery) {
  return useQuery(incidentsQueryOptions(filters));
}
