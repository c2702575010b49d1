import { trainingListSchema, type Training } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { trainingKeys } from './training-keys';

const byName = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

export async function getTrainings(signal?: AbortSignal): Promise<Training[]> {
  const trainings = await api.get('/trainings', { schema: trainingListSchema, signal });
  return [...trainings].sort((a, b) => byName.compare(a.name, b.name));
}

export function trainingsQueryOptions() {
  return queryOptions({
    queryKey: trainingKeys.list(),
    queryFn: ({ signal }) => getTrainings(signal),
  });
}

export function useTrainings() {
  return useQuery(trainingsQueryOptions());
}
