export type SortOrder = 'asc' | 'desc';

export interface ColumnSort<F extends string> {
  field: F;
  order: SortOrder;
}

/** A column the list can be sorted on, and its heading. */
export interface SortColumn<F extends string> {
  field: F;
  label: string;
}

/** Names as people read them: "item 9" before "item 10", "Zoë" beside "zoe". */
export const nameCollator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/** An instant as a number to sort by; a row without one sorts after every dated row. */
export function instantOrLast(iso: string | null): number {
  return iso ? Date.parse(iso) : Number.POSITIVE_INFINITY;
}

/** How each sortable column orders two rows, A to Z or soonest first. */
export type ColumnComparers<T, F extends string> = Record<F, (a: T, b: T) => number>;

/**
 * A short list sorted in the browser on one column, either way round; rows equal on it keep
 * the order of `tieBreak`, whichever way the column runs.
 */
export function sortRows<T, F extends string>(
  rows: readonly T[],
  sort: ColumnSort<F>,
  comparers: ColumnComparers<T, F>,
  tieBreak: (a: T, b: T) => number,
): T[] {
  const direction = sort.order === 'asc' ? 1 : -1;
  const compare = comparers[sort.field];
  return [...rows].sort((a, b) => direction * compare(a, b) || tieBreak(a, b));
}

/** The order after a click on `clicked`: the sorted column turns round; a new column starts A to Z, or soonest first. */
export function nextOrder<F extends string>(sortedField: F, sortedOrder: SortOrder, clicked: F): SortOrder {
  if (sortedField !== clicked) return 'asc';
  return sortedOrder === 'asc' ? 'desc' : 'asc';
}

/** The sort after a click on a column's heading. */
export function nextSort<F extends string>(current: ColumnSort<F>, clicked: F): ColumnSort<F> {
  return { field: clicked, order: nextOrder(current.field, current.order, clicked) };
}
