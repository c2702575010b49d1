import { classSchema, type ClassDetail } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { classKeys } from './class-keys';

/** POST /api/classes as the form sends it: instants with their offset, as `toISOString()` writes them. */
export interface ClassRequestBody {
  machineId: string;
  trainingId: string | null;
  title: string;
  start: string;
  end: string;
  weeks: number;
  capacity: number | null;
}

export function createClass(body: ClassRequestBody): Promise<ClassDetail> {
  return api.post('/classes', { body, schema: classSchema });
}

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClass,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }),
  });
}
