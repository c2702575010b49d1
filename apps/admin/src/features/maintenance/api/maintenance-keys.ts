export const maintenanceKeys = {
  all: ['maintenance'] as const,
  list: () => [...maintenanceKeys.all, 'list'] as const,
  machine: (machineId: string) => [...maintenanceKeys.all, 'machine', machineId] as const,
};
