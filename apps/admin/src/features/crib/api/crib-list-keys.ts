/**
 * Query keys of the crib's lists. Every crib key starts with `crib`, so a checkout or a return
 * refreshes the inventory's "available" too by invalidating that one prefix.
 */
export const cribListKeys = {
  all: ['crib'] as const,
  checkouts: (open: boolean) => [...cribListKeys.all, 'checkouts', { open }] as const,
  checkoutItems: () => [...cribListKeys.all, 'checkout-items'] as const,
  attention: () => [...cribListKeys.all, 'attention'] as const,
  overdue: () => [...cribListKeys.all, 'overdue'] as const,
  mine: () => [...cribListKeys.all, 'mine'] as const,
};
