import type { SignOff } from '@chuckkey/core';

export const signOffSortFields = ['member', 'training', 'level', 'expires', 'signedBy'] as const;
export type SignOffSortField = (typeof signOffSortFields)[number];
export type SortOrder = 'asc' | 'desc';

export interface SignOffSort {
  field: SignOffSortField;
  order: SortOrder;
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

// Never-lapsing sign-offs sort after every dated one: they are the furthest from needing work.
function expiryKey(signOff: SignOff): number {
  return signOff.expiresAt ? Date.parse(signOff.expiresAt) : Number.POSITIVE_INFINITY;
}

function compare(a: SignOff, b: SignOff, field: SignOffSortField): number {
  switch (field) {
    case 'member':
      return collator.compare(a.memberName, b.memberName);
    case 'training':
      return collator.compare(a.trainingName, b.trainingName);
    case 'level':
      return collator.compare(a.level, b.level);
    case 'signedBy':
      return collator.compare(a.signedBy.name, b.signedBy.name);
    case 'expires':
      return expiryKey(a) - expiryKey(b);
  }
}

/** The report is short (one shop's 30 days), so it is sorted in the browser; ties keep the soonest expiry first. */
export function sortSignOffs(signOffs: readonly SignOff[], sort: SignOffSort): SignOff[] {
  const direction = sort.order === 'asc' ? 1 : -1;
  return [...signOffs].sort((a, b) => direction * compare(a, b, sort.field) || expiryKey(a) - expiryKey(b));
}

/** Clicking the sorted column turns it round; a new column starts A to Z, or soonest first. */
export function nextSignOffSort(current: SignOffSort, field: SignOffSortField): SignOffSort {
  if (current.field === field) return { field, order: current.order === 'asc' ? 'desc' : 'asc' };
  return { field, order: 'asc' };
}
