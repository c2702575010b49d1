import {
  machineReservationRulesSchema,
  type MachineReservationRules,
  type ReservationRulesInput,
} from '@chuckkey/core';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { machineKeys } from './machine-keys';

/** The machine's current booking rules. */
export function getReservationRules(machineId: string, signal?: AbortSignal): Promise<MachineReservationRules> {
  return api.get(`/machines/${encodeURIComponent(machineId)}/reservation-rules`, { schema: machineReservationRulesSchema, signal });
}

export function reservationRulesQueryOptions(machineId: string) {
  return queryOptions({
    queryKey: machineKeys.reservationRules(machineId),
    queryFn: ({ signal }) => getReservationRules(machineId, signal),
  });
}

export function useReservationRules(machineId: string) {
  return useQuery(reservationRulesQueryOptions(machineId));
}

export interface UpdateReservationRulesInput {
  machineId: string;
  rules: ReservationRulesInput;
}

export function updateReservationRules({ machineId, rules }: UpdateReservationRulesInput): Promise<MachineReservationRules> {
  return api.put(`/machines/${encodeURIComponent(machineId)}/reservation-rules`, { body: rules, schema: machineReservationRulesSchema });
}

export function useUpdateReservationRules() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateReservationRules,
    onSuccess: (saved) => queryClient.setQueryData(machineKeys.reservationRules(saved.machineId), saved),
  });
}
