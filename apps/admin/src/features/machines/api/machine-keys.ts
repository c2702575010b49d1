export const machineKeys = {
  all: ['machines'] as const,
  lists: () => [...machineKeys.all, 'list'] as const,
  list: () => [...machineKeys.lists()] as const,
  details: () => [...machineKeys.all, 'detail'] as const,
  detail: (id: string) => [...machineKeys.details(), id] as const,
  states: () => [...machineKeys.all, 'states'] as const,
  reservationRules: (id: string) => [...machineKeys.detail(id), 'reservation-rules'] as const,
};
