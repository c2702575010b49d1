import { trainingSchema, type Training, type TrainingInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { trainingKeys } from './training-keys';

export function createTraining(input: TrainingInput): Promise<Training> {
  return api.post('/trainings', { body: input, schema: trainingSchema });
}

export function useCreateTraining() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTraining,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
