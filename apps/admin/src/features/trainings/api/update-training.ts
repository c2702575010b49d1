import { trainingSchema, type Training, type TrainingInput } from '@chuckkey/core';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { trainingKeys } from './training-keys';

export interface UpdateTrainingInput {
  id: string;
  training: TrainingInput;
}

export function updateTraining({ id, training }: UpdateTrainingInput): Promise<Training> {
  return api.put(`/trainings/${encodeURIComponent(id)}`, { body: training, schema: trainingSchema });
}

export function useUpdateTraining() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTraining,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingKeys.all }),
  });
}
