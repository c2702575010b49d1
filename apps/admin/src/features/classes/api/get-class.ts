import { classSchema, type ClassDetail } from '@chuckkey/core';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

export function getClass(classId: string, signal?: AbortSignal): Promise<ClassDetail> {
  return api.get(`/classes/${encodeURIComponent(classId)}`, { schema: classSchema, signal });
}

export function classQueryOptions(classId: string) {
  return queryOptions({
    queryKey: classKeys.detail(classId),
    queryFn: ({ signal }) => getClass(classId, signal),
  });
}

export function useClass(classId: string) {
  return useQuery(classQueryOptions(classId));
}
