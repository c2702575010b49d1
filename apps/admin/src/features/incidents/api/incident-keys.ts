import type { IncidentListQuery } from '@chuckkey/core';

export const incidentKeys = {
  all: ['incidents'] as const,
  list: (filters: IncidentListQuery) => ['incidents', 'list', filters] as const,
  detail: (id: string) => ['incidents', 'detail', id] as const,
};
