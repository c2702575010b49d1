import type { CribStationConsumable, CribStationItem } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { addTool, basketRequest, canConfirm, markLine, quantityOf, removeLine, setConsumable } from './basket';

const CHICAGO = 'America/Chicago';
// Saturday 7 March 2026, 10:00 CST (UTC−6): IANA tz database via Intl.
const now = new Date('2026-03-07T16:00:00Z');

const gauge: CribStationItem = {
  id: '0b7f3c1e-2d4a-4b8e-9c6f-1a2b3c4d5e6f',
  kind: 'tool',
  name: 'Telescoping bore gauge set',
  assetTag: 'CK-0104',
  binLocation: 'B2',
  available: true,
  dueAt: '2026-03-08T00:00:00Z',
  openCheckout: null,
};
const inserts: CribStationConsumable = { id: '6e5d4c3b-2a19-4f8e-8d7c-6b5a4f3e2d1c', name: 'Carbide insert, CCMT', unit: 'each', stock: 4, binLocation: 'C4' };

describe('the crib basket', () => {
  it('adds a scanned tool once, with its due time', () => {
    const first = addTool([], gauge, now, CHICAGO);
    expect(first.added).toBe('added');
    expect(first.lines).toEqual([{ kind: 'tool', itemId: gauge.id, name: gauge.name, assetTag: 'CK-0104', dueAt: gauge.dueAt, problem: null }]);
    const again = addTool(first.lines, gauge, now, CHICAGO);
    expect(again.added).toBe('already_in_basket');
    expect(again.lines).toHaveLength(1);
  });

  it('gives a tool out to someone else its line with who has it, and holds the checkout back', () => {
    const out = { ...gauge, available: false, openCheckout: { id: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d', memberFirstName: 'Ines', dueAt: '2026-03-08T00:00:00Z' } };
    const { lines, added } = addTool([], out, now, CHICAGO);
    expect(added).toBe('not_available');
    expect(lines[0]?.problem).toBe('Out to Ines until 18:00');
    expect(canConfirm(lines)).toBe(false);
    expect(canConfirm(removeLine(lines, out.id))).toBe(false);
  });

  it('keeps a consumable’s count within its stock and drops the line at zero', () => {
    let lines = setConsumable([], inserts, 2);
    expect(quantityOf(lines, inserts.id)).toBe(2);
    lines = setConsumable(lines, inserts, 9);
    expect(quantityOf(lines, inserts.id)).toBe(4);
    expect(setConsumable(lines, inserts, 0)).toEqual([]);
  });

  it('keeps a consumable’s place in the basket when its count changes', () => {
    const withTool = addTool(setConsumable([], inserts, 1), gauge, now, CHICAGO).lines;
    expect(setConsumable(withTool, inserts, 3).map((line) => line.itemId)).toEqual([inserts.id, gauge.id]);
  });

  it('marks the line the server refused until the member changes it', () => {
    const lines = setConsumable(addTool([], gauge, now, CHICAGO).lines, inserts, 3);
    const marked = markLine(lines, inserts.id, 'Only 2 left.');
    expect(marked.map((line) => line.problem)).toEqual([null, 'Only 2 left.']);
    expect(canConfirm(marked)).toBe(false);
    expect(canConfirm(setConsumable(marked, inserts, 2))).toBe(true);
  });

  it('sends a tool as one and a consumable by its count', () => {
    const lines = setConsumable(addTool([], gauge, now, CHICAGO).lines, inserts, 3);
    expect(basketRequest(lines)).toEqual([
      { itemId: gauge.id, quantity: 1 },
      { itemId: inserts.id, quantity: 3 },
    ]);
  });
});
