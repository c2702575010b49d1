import type { CribCheckout } from '@chuckkey/core';
import { instantOrLast, nameCollator, sortRows, type ColumnComparers, type ColumnSort } from '../../../lib/table-sort';

const MINUTE_MS = 60_000;
const HOUR_MIN = 60;
const DAY_MIN = 24 * HOUR_MIN;

/** "45 min", "3 h 10 min", "2 days": whole minutes, and whole days once it is two days or more. */
export function lengthWords(ms: number): string {
  const minutes = Math.max(1, Math.round(Math.abs(ms) / MINUTE_MS));
  if (minutes >= 2 * DAY_MIN) return `${Math.floor(minutes / DAY_MIN)} days`;
  const h = Math.floor(minutes / HOUR_MIN);
  const m = minutes % HOUR_MIN;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

export type DueState = 'overdue' | 'due_soon' | 'on_time' | 'none';

/** Within this of its due time a tool is "due soon": time to bring it back. */
export const DUE_SOON_MS = 60 * MINUTE_MS;

export interface Due {
  state: DueState;
  /** "Overdue by 2 h", "Due in 45 min", "No due time" */
  words: string;
}

/** Whether a checkout is overdue, in a state and in words; a consumable take has no due time. */
export function dueOf(dueAt: string | null, now: Date): Due {
  if (!dueAt) return { state: 'none', words: 'No due time' };
  const left = Date.parse(dueAt) - now.getTime();
  if (left <= 0) return { state: 'overdue', words: `Overdue by ${lengthWords(left)}` };
  return { state: left <= DUE_SOON_MS ? 'due_soon' : 'on_time', words: `Due in ${lengthWords(left)}` };
}

export const checkoutSortFields = ['member', 'item', 'checkedOut', 'due'] as const;
export type CheckoutSortField = (typeof checkoutSortFields)[number];
export type CheckoutSort = ColumnSort<CheckoutSortField>;

export interface CheckoutView {
  search: string;
  sort: CheckoutSort;
  page: number;
}

export const CHECKOUT_PAGE_SIZE = 25;

/** Lower case without accents, so "zoe" finds "Zoë". */
function fold(text: string): string {
  return text.normalize('NFD').replace(/\p{Diacritic}/gu, '').toLowerCase();
}

// A take without a due time sorts after every dated checkout: nothing is waited for.
const byDue = (a: CribCheckout, b: CribCheckout) => instantOrLast(a.dueAt) - instantOrLast(b.dueAt);

const comparers: ColumnComparers<CribCheckout, CheckoutSortField> = {
  member: (a, b) => nameCollator.compare(a.memberName, b.memberName),
  item: (a, b) => nameCollator.compare(a.itemName, b.itemName),
  checkedOut: (a, b) => Date.parse(a.checkedOutAt) - Date.parse(b.checkedOutAt),
  due: byDue,
};

/** Checkouts whose member or item holds every word of the search, in any order. */
export function searchCheckouts(checkouts: readonly CribCheckout[], search: string): CribCheckout[] {
  const words = fold(search).split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...checkouts];
  return checkouts.filter((checkout) => {
    const text = fold(`${checkout.memberName} ${checkout.itemName}`);
    return words.every((word) => text.includes(word));
  });
}

/** The crib's lists are one shop's worth, so they are searched, sorted and paged in the browser; ties keep the soonest due first. */
export function checkoutPage(checkouts: readonly CribCheckout[], view: CheckoutView): { items: CribCheckout[]; total: number } {
  const sorted = sortRows(searchCheckouts(checkouts, view.search), view.sort, comparers, byDue);
  const start = (view.page - 1) * CHECKOUT_PAGE_SIZE;
  return { items: sorted.slice(start, start + CHECKOUT_PAGE_SIZE), total: sorted.length };
}
