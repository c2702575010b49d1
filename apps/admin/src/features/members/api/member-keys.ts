import type { MemberListQuery } from '@chuckkey/core';

export const memberKeys = {
  all: ['members'] as const,
  lists: () => [...memberKeys.all, 'list'] as const,
  list: (filters: MemberListQuery) => [...memberKeys.lists(), filters] as const,
};
