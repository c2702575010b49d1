import { describe, expect, it } from 'vitest';
import { instantOrLast, nameCollator, nextOrder, nextSort, sortRows } from './table-sort';

interface Row {
  name: string;
  at: string | null;
}

const rows: Row[] = [
  { name: 'Odile Vance', at: '2026-12-03T09:00:00.000Z' },
  { name: 'bram Ostrow', at: null },
  { name: 'Cato Wendt', at: '2026-12-01T09:00:00.000Z' },
  { name: 'Odile Vance', at: '2026-12-02T09:00:00.000Z' },
];

const comparers = {
  name: (a: Row, b: Row) => nameCollator.compare(a.name, b.name),
  at: (a: Row, b: Row) => instantOrLast(a.at) - instantOrLast(b.at),
};

describe('sortRows', () => {
  it('sorts on the chosen column either way round, names without regard to capitals', () => {
    // ECMA-402 Intl.Collator, sensitivity "base": "bram" and "Bram" compare equal, so capitals do not decide.
    expect(sortRows(rows, { field: 'name', order: 'asc' }, comparers, comparers.at).map((row) => row.name)).toEqual([
      'bram Ostrow',
      'Cato Wendt',
      'Odile Vance',
      'Odile Vance',
    ]);
    expect(sortRows(rows, { field: 'name', order: 'desc' }, comparers, comparers.at).map((row) => row.name)).toEqual([
      'Odile Vance',
      'Odile Vance',
      'Cato Wendt',
      'bram Ostrow',
    ]);
  });

  it('keeps the tie-break order for rows equal on the column, whichever way it runs', () => {
    for (const order of ['asc', 'desc'] as const) {
      const odile = sortRows(rows, { field: 'name', order }, comparers, comparers.at).filter((row) => row.name === 'Odile Vance');
      expect(odile.map((row) => row.at)).toEqual(['2026-12-02T09:00:00.000Z', '2026-12-03T09:00:00.000Z']);
    }
  });

  it('puts rows without an instant after every dated one', () => {
    expect(sortRows(rows, { field: 'at', order: 'asc' }, comparers, comparers.name).map((row) => row.at)).toEqual([
      '2026-12-01T09:00:00.000Z',
      '2026-12-02T09:00:00.000Z',
      '2026-12-03T09:00:00.000Z',
      null,
    ]);
  });

  it('leaves the list it was given as it was', () => {
    const before = [...rows];
    sortRows(rows, { field: 'name', order: 'desc' }, comparers, comparers.at);
    expect(rows).toEqual(before);
  });
});

describe('nextOrder', () => {
  // Common practice for sortable tables: a second click on a column reverses it, another column starts ascending.
  it('turns the sorted column round and starts a new column ascending', () => {
    expect(nextOrder('at', 'asc', 'at')).toBe('desc');
    expect(nextOrder('at', 'desc', 'at')).toBe('asc');
    expect(nextOrder<'at' | 'name'>('at', 'desc', 'name')).toBe('asc');
    expect(nextSort<'at' | 'name'>({ field: 'at', order: 'desc' }, 'name')).toEqual({ field: 'name', order: 'asc' });
  });
});
