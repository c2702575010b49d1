import type { CribCheckout } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { CHECKOUT_PAGE_SIZE, checkoutPage, dueOf, lengthWords, searchCheckouts } from './crib-checkouts-rows';

let next = 0;
function checkout(memberName: string, itemName: string, dueAt: string | null, checkedOutAt = '2026-11-30T09:00:00.000Z'): CribCheckout {
  next += 1;
  const id = `00000000-0000-4000-8000-${String(next).padStart(12, '0')}`;
  return {
    id,
    itemId: id,
    itemKind: dueAt ? 'tool' : 'consumable',
    itemName,
    memberId: id,
    memberName,
    quantity: 1,
    checkedOutAt,
    dueAt,
    returnedAt: null,
    returnCondition: null,
    returnNote: null,
    unitPriceCents: dueAt ? null : 450,
  };
}

const now = new Date('2026-12-01T15:00:00.000Z');

describe('dueOf', () => {
  it('says how long a tool has been overdue once its due time has passed, the due instant included', () => {
    // Product rule (product.md, Crib): a checkout is overdue from its due time on; no published source.
    expect(dueOf('2026-12-01T12:45:00.000Z', now)).toEqual({ state: 'overdue', words: 'Overdue by 2 h 15 min' });
    expect(dueOf('2026-12-01T15:00:00.000Z', now).state).toBe('overdue');
  });

  it('calls a tool due within the hour "due soon" and one due later "on time"', () => {
    // The one-hour warning is the shop's own choice: common practice, no published source.
    expect(dueOf('2026-12-01T15:45:00.000Z', now)).toEqual({ state: 'due_soon', words: 'Due in 45 min' });
    expect(dueOf('2026-12-01T18:00:00.000Z', now)).toEqual({ state: 'on_time', words: 'Due in 3 h' });
  });

  it('gives a consumable take no due time', () => {
    expect(dueOf(null, now)).toEqual({ state: 'none', words: 'No due time' });
  });
});

describe('lengthWords', () => {
  it('counts whole minutes, hours and minutes under two days, and whole days from two days on', () => {
    // Common practice, no published source: under a minute still reads as one, never "0 min".
    expect(lengthWords(20_000)).toBe('1 min');
    expect(lengthWords(90 * 60_000)).toBe('1 h 30 min');
    expect(lengthWords(47 * 3_600_000)).toBe('47 h');
    expect(lengthWords(2 * 86_400_000)).toBe('2 days');
    expect(lengthWords(-(3 * 86_400_000 + 5 * 3_600_000))).toBe('3 days');
  });
});

describe('searchCheckouts', () => {
  const list = [checkout('Zoë Brennick', 'Telescoping bore gauge', '2026-12-01T17:00:00.000Z'), checkout('Tamsin Orr', 'Outside micrometer 0–1 in', '2026-12-01T16:00:00.000Z')];

  it('finds a checkout by every word of the search in its member or item, without regard to case or accents', () => {
    // Unicode UAX #15: NFD splits "ë" into "e" and a combining diaeresis, which is then dropped.
    expect(searchCheckouts(list, 'zoe bore').map((row) => row.memberName)).toEqual(['Zoë Brennick']);
    expect(searchCheckouts(list, 'MICROMETER').map((row) => row.memberName)).toEqual(['Tamsin Orr']);
    expect(searchCheckouts(list, 'zoe micrometer')).toEqual([]);
    expect(searchCheckouts(list, '  ')).toHaveLength(2);
  });
});

describe('checkoutPage', () => {
  it('sorts by the chosen column and puts takes without a due time after every dated checkout', () => {
    const list = [
      checkout('Tamsin Orr', 'Flap disc', null),
      checkout('Anselm Quade', 'Boring bar', '2026-12-01T18:00:00.000Z'),
      checkout('Bettina Lusk', 'Thread gauge', '2026-12-01T16:00:00.000Z'),
    ];
    const byDue = checkoutPage(list, { search: '', sort: { field: 'due', order: 'asc' }, page: 1 });
    expect(byDue.items.map((row) => row.itemName)).toEqual(['Thread gauge', 'Boring bar', 'Flap disc']);
    const byMember = checkoutPage(list, { search: '', sort: { field: 'member', order: 'desc' }, page: 1 });
    expect(byMember.items.map((row) => row.memberName)).toEqual(['Tamsin Orr', 'Bettina Lusk', 'Anselm Quade']);
  });

  it('cuts the sorted list into pages and counts every match', () => {
    const list = Array.from({ length: CHECKOUT_PAGE_SIZE + 3 }, (_, index) => checkout(`Member ${index + 1}`, 'Bore gauge', `2026-12-02T${String(index % 24).padStart(2, '0')}:00:00.000Z`));
    const second = checkoutPage(list, { search: '', sort: { field: 'member', order: 'asc' }, page: 2 });
    expect(second.total).toBe(CHECKOUT_PAGE_SIZE + 3);
    // ECMA-402 Intl.Collator, option numeric: digits compare as numbers, so "Member 26" follows "Member 9".
    expect(second.items.map((row) => row.memberName)).toEqual(['Member 26', 'Member 27', 'Member 28']);
  });
});
