// Under the crib's own prefix, so that a checkout or a return anywhere in the crib refreshes the inventory too.
export const cribItemKeys = {
  all: ['crib', 'items'] as const,
  list: () => [...cribItemKeys.all, 'list'] as const,
};
