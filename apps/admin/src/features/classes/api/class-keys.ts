export const classKeys = {
  all: ['classes'] as const,
  lists: () => [...classKeys.all, 'list'] as const,
  list: (from: string, to: string) => [...classKeys.lists(), from, to] as const,
  details: () => [...classKeys.all, 'detail'] as const,
  detail: (classId: string) => [...classKeys.details(), classId] as const,
};
