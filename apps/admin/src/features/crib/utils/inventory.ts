import { cribConditions, cribItemKinds, type CribCondition, type CribItem } from '@chuckkey/core';
import { z } from 'zod';
import { nextOrder, type SortColumn } from '../../../lib/table-sort';

export const INVENTORY_PAGE_SIZE = 25;

export const inventorySorts = ['name', 'kind', 'assetTag', 'binLocation', 'level', 'inCirculation', 'available'] as const;
export type InventorySort = (typeof inventorySorts)[number];
export const availabilities = ['available', 'unavailable'] as const;
export type Availability = (typeof availabilities)[number];

export const kindLabels: Record<CribItem['kind'], string> = { tool: 'Tool', consumable: 'Consumable' };
export const conditionLabels: Record<CribCondition, string> = { good: 'Good', needs_attention: 'Needs attention', damaged: 'Damaged' };
export const availabilityLabels: Record<Availability, string> = { available: 'Available', unavailable: 'Not available' };

export const inventoryColumns: SortColumn<InventorySort>[] = [
  { field: 'name', label: 'Name' },
  { field: 'kind', label: 'Kind' },
  { field: 'assetTag', label: 'Asset tag' },
  { field: 'binLocation', label: 'Bin' },
  { field: 'level', label: 'Condition / stock' },
  { field: 'inCirculation', label: 'In circulation' },
  { field: 'available', label: 'Available' },
];

const filtersSchema = z.object({
  search: z.string().trim().max(200).optional().catch(undefined),
  kind: z.enum(cribItemKinds).optional().catch(undefined),
  availability: z.enum(availabilities).optional().catch(undefined),
  sort: z.enum(inventorySorts).catch('name'),
  order: z.enum(['asc', 'desc']).catch('asc'),
  page: z.coerce.number().int().min(1).max(10_000).catch(1),
});
export type InventoryFilters = z.output<typeof filtersSchema>;

const urlKeys = ['search', 'kind', 'availability', 'sort', 'order', 'page'] as const;

/** The table's state lives in the URL, so a view can be bookmarked; a mangled value falls back on its own. */
export function readInventoryFilters(params: URLSearchParams): InventoryFilters {
  const raw: Record<string, string | undefined> = {};
  for (const key of urlKeys) raw[key] = params.get(key)?.trim() || undefined;
  const filters = filtersSchema.parse(raw);
  return { ...filters, search: filters.search || undefined };
}

export function inventoryFiltersToSearchParams(filters: InventoryFilters): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.search) params.set('search', filters.search);
  if (filters.kind) params.set('kind', filters.kind);
  if (filters.availability) params.set('availability', filters.availability);
  if (filters.sort !== 'name' || filters.order !== 'asc') {
    params.set('sort', filters.sort);
    params.set('order', filters.order);
  }
  if (filters.page > 1) params.set('page', String(filters.page));
  return params;
}

/** Clicking the sorted column turns its order round; another column starts ascending. */
export function nextSort(filters: InventoryFilters, sort: InventorySort): Pick<InventoryFilters, 'sort' | 'order'> {
  return { sort, order: nextOrder(filters.sort, filters.order, sort) };
}

/**
 * Where a consumable's stock stands against its reorder level. The reorder level is the count at
 * which more is ordered (common practice for a reorder point), so reaching it already counts.
 */
export function reorderState(item: Pick<CribItem, 'kind' | 'stock' | 'reorderLevel'>): 'below' | 'at' | null {
  if (item.kind !== 'consumable' || item.stock === null || item.reorderLevel === null) return null;
  if (item.stock < item.reorderLevel) return 'below';
  if (item.stock === item.reorderLevel) return 'at';
  return null;
}

function matches(item: CribItem, words: string[]): boolean {
  const text = [item.name, item.assetTag, item.serialNumber, item.binLocation, item.unit].filter(Boolean).join(' ').toLocaleLowerCase();
  return words.every((word) => text.includes(word));
}

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });
const conditionRank = (condition: CribCondition | null) => (condition ? cribConditions.indexOf(condition) : -1);

function compareBy(sort: InventorySort): (a: CribItem, b: CribItem) => number {
  const text = (value: (item: CribItem) => string | null) => (a: CribItem, b: CribItem) => {
    const x = value(a);
    const y = value(b);
    // A blank cell (a consumable has no asset tag) counts as after every value.
    if (x === null || y === null) return x === y ? 0 : x === null ? 1 : -1;
    return collator.compare(x, y);
  };
  switch (sort) {
    case 'name':
      return text((item) => item.name);
    case 'kind':
      return text((item) => kindLabels[item.kind]);
    case 'assetTag':
      return text((item) => item.assetTag);
    case 'binLocation':
      return text((item) => item.binLocation);
    case 'level':
      // Tools by condition (good first), then consumables by the count left.
      return (a, b) =>
        a.kind !== b.kind ? (a.kind === 'tool' ? -1 : 1) : a.kind === 'tool' ? conditionRank(a.condition) - conditionRank(b.condition) : (a.stock ?? 0) - (b.stock ?? 0);
    case 'inCirculation':
      return (a, b) => Number(b.inCirculation) - Number(a.inCirculation);
    case 'available':
      return (a, b) => Number(b.available) - Number(a.available);
  }
}

/** The items that pass the search and filters, in the chosen order (ties by name), all pages together. */
export function visibleItems(items: readonly CribItem[], filters: InventoryFilters): CribItem[] {
  const words = (filters.search ?? '').toLocaleLowerCase().split(/\s+/).filter(Boolean);
  const compare = compareBy(filters.sort);
  const byName = compareBy('name');
  const direction = filters.order === 'asc' ? 1 : -1;
  return items
    .filter((item) => (!filters.kind || item.kind === filters.kind) && (!filters.availability || item.available === (filters.availability === 'available')) && matches(item, words))
    .sort((a, b) => direction * compare(a, b) || byName(a, b));
}

export function pageOf<T>(items: readonly T[], page: number, pageSize = INVENTORY_PAGE_SIZE): { items: T[]; total: number } {
  return { items: items.slice((page - 1) * pageSize, page * pageSize), total: items.length };
}

/** A price in cents as the shop writes money: two decimals, no currency sign (the shop keeps one currency). */
export function formatPrice(cents: number): string {
  return (cents / 100).toFixed(2);
}

/** "4.5", "4.50" or "4" → 450 cents; null for anything that is not an amount with at most two decimals. */
export function parsePrice(text: string): number | null {
  const match = /^(\d{1,7})(?:[.,](\d{1,2}))?$/.exec(text.trim());
  if (!match) return null;
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
}
