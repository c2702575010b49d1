import { classListSchema, type ClassList } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

export function getClasses(from: string, to: string, signal?: AbortSignal): Promise<ClassList> {
  return api.get('/classes', { query: { from, to }, schema: classListSchema, signal });
}

export function classesQueryOptions(from: string, to: string) {
  return queryOptions({
    queryKey: classKeys.list(from, to),
    queryFn: ({ signal }) => getClasses(from, to, signal),
    placeholderData: keepPreviousData,
  });
}

export function useClasses(from: string, to: string) {
  return useQuery(classesQueryOptions(from, to));
}
