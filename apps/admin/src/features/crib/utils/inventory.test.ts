import type { CribItem } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { formatPrice, inventoryFiltersToSearchParams, pageOf, parsePrice, readInventoryFilters, reorderState, visibleItems } from './inventory';

let next = 0;
function item(fields: Partial<CribItem>): CribItem {
  next += 1;
  const tool = (fields.kind ?? 'tool') === 'tool';
  return {
    id: `00000000-0000-4000-8000-${String(next).padStart(12, '0')}`,
    kind: 'tool',
    name: `Item ${next}`,
    binLocation: null,
    assetTag: tool ? `T-${next}` : null,
    serialNumber: null,
    condition: tool ? 'good' : null,
    inCirculation: true,
    loanPeriodHours: null,
    unit: tool ? null : 'each',
    stock: tool ? null : 10,
    reorderLevel: null,
    priceCents: tool ? null : 100,
    available: true,
    hasPhoto: false,
    ...fields,
  };
}

const filters = (params: string) => readInventoryFilters(new URLSearchParams(params));

describe('inventory filters', () => {
  const micrometer = item({ name: 'Outside micrometer 0–1 in', assetTag: 'MIC-01', binLocation: 'A1' });
  const boreGauge = item({ name: 'Telescoping bore gauge', assetTag: 'BG-02', binLocation: 'A2', available: false });
  const wire = item({ kind: 'consumable', name: 'Mild steel MIG wire 0.8 mm', unit: 'spool', stock: 3, binLocation: 'W1' });
  const all = [wire, boreGauge, micrometer];

  it('finds an item by every word of the search, in its name, asset tag or bin, ignoring case', () => {
    expect(visibleItems(all, filters('search=bore')).map((i) => i.id)).toEqual([boreGauge.id]);
    expect(visibleItems(all, filters('search=mic-01')).map((i) => i.id)).toEqual([micrometer.id]);
    expect(visibleItems(all, filters('search=steel+w1')).map((i) => i.id)).toEqual([wire.id]);
    expect(visibleItems(all, filters('search=steel+a1'))).toEqual([]);
  });

  it('filters by kind and by availability', () => {
    expect(visibleItems(all, filters('kind=consumable')).map((i) => i.id)).toEqual([wire.id]);
    expect(visibleItems(all, filters('availability=unavailable')).map((i) => i.id)).toEqual([boreGauge.id]);
    expect(visibleItems(all, filters('kind=tool&availability=available')).map((i) => i.id)).toEqual([micrometer.id]);
  });

  it('sorts by name A to Z by default, and turns round on desc', () => {
    expect(visibleItems(all, filters('')).map((i) => i.name)).toEqual([wire.name, micrometer.name, boreGauge.name]);
    expect(visibleItems(all, filters('sort=name&order=desc')).map((i) => i.name)).toEqual([boreGauge.name, micrometer.name, wire.name]);
  });

  it('sorts asset tags by their numbers as people read them, blank tags after the others', () => {
    const nine = item({ assetTag: 'T-9' });
    const ten = item({ assetTag: 'T-10' });
    expect(visibleItems([ten, wire, nine], filters('sort=assetTag')).map((i) => i.assetTag)).toEqual(['T-9', 'T-10', null]);
  });

  it('falls back to defaults for values mangled by hand, keeping the rest', () => {
    expect(filters('kind=hammer&sort=colour&order=up&page=-3&search=gauge')).toEqual({
      search: 'gauge',
      kind: undefined,
      availability: undefined,
      sort: 'name',
      order: 'asc',
      page: 1,
    });
  });

  it('writes the filters back to the URL without the defaults', () => {
    expect(inventoryFiltersToSearchParams(filters('kind=tool&sort=name&order=asc&page=1')).toString()).toBe('kind=tool');
    expect(inventoryFiltersToSearchParams(filters('sort=bin&page=2')).toString()).toBe('page=2');
    expect(inventoryFiltersToSearchParams(filters('sort=binLocation&order=desc')).toString()).toBe('sort=binLocation&order=desc');
  });

  it('pages 25 a page', () => {
    const many = Array.from({ length: 30 }, () => item({}));
    expect(pageOf(many, 1).items).toHaveLength(25);
    expect(pageOf(many, 2)).toEqual({ items: many.slice(25), total: 30 });
  });
});

describe('reorderState', () => {
  it('says when a consumable has reached or fallen below its reorder level, and nothing for tools', () => {
    // Common practice for a reorder point: the count at which more is ordered.
    expect(reorderState({ kind: 'consumable', stock: 1, reorderLevel: 2 })).toBe('below');
    expect(reorderState({ kind: 'consumable', stock: 2, reorderLevel: 2 })).toBe('at');
    expect(reorderState({ kind: 'consumable', stock: 3, reorderLevel: 2 })).toBeNull();
    expect(reorderState({ kind: 'consumable', stock: 0, reorderLevel: null })).toBeNull();
    expect(reorderState({ kind: 'tool', stock: null, reorderLevel: null })).toBeNull();
  });
});

describe('prices', () => {
  it('reads an amount with up to two decimals into cents, and refuses anything else', () => {
    expect(parsePrice('4.50')).toBe(450);
    expect(parsePrice('4.5')).toBe(450);
    expect(parsePrice('4,05')).toBe(405);
    expect(parsePrice(' 12 ')).toBe(1200);
    expect(parsePrice('0')).toBe(0);
    expect(parsePrice('4.505')).toBeNull();
    expect(parsePrice('-1')).toBeNull();
    expect(parsePrice('four')).toBeNull();
    expect(parsePrice('')).toBeNull();
  });

  it('writes cents with two decimals', () => {
    expect(formatPrice(450)).toBe('4.50');
    expect(formatPrice(5)).toBe('0.05');
  });
});
