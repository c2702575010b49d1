import type { SignOff } from '@chuckkey/core';
import { instantOrLast, nameCollator, sortRows, type ColumnComparers, type ColumnSort } from '../../../lib/table-sort';

export const signOffSortFields = ['member', 'training', 'level', 'expires', 'signedBy'] as const;
export type SignOffSortField = (typeof signOffSortFields)[number];
export type SignOffSort = ColumnSort<SignOffSortField>;

// Never-lapsing sign-offs sort after every dated one: they are the furthest from needing work.
const byExpiry = (a: SignOff, b: SignOff) => instantOrLast(a.expiresAt) - instantOrLast(b.expiresAt);

const comparers: ColumnComparers<SignOff, SignOffSortField> = {
  member: (a, b) => nameCollator.compare(a.memberName, b.memberName),
  training: (a, b) => nameCollator.compare(a.trainingName, b.trainingName),
  level: (a, b) => nameCollator.compare(a.level, b.level),
  signedBy: (a, b) => nameCollator.compare(a.signedBy.name, b.signedBy.name),
  expires: byExpiry,
};

/** The report is short (one shop's 30 days), so it is sorted in the browser; ties keep the soonest expiry first. */
export function sortSignOffs(signOffs: readonly SignOff[], sort: SignOffSort): SignOff[] {
  return sortRows(signOffs, sort, comparers, byExpiry);
}
