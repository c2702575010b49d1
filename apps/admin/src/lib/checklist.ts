import { checklistItemId, checklistItemSchema, type ChecklistItem } from '@chuckkey/core';
import { z } from 'zod';

/** A checklist item being edited: `id` is empty until it is first saved; `key` lives only in the browser. */
export interface ChecklistDraftItem {
  key: string;
  id: string;
  label: string;
}

export const checklistDraftSchema = z
  .array(z.object({ key: z.string(), id: z.string(), label: checklistItemSchema.shape.label }))
  .max(40, { error: 'Use at most 40 items.' });

let keySeed = 0;
export function newDraftKey(): string {
  keySeed += 1;
  return `draft-${keySeed}`;
}

export function toDraft(items: readonly ChecklistItem[]): ChecklistDraftItem[] {
  return items.map((item) => ({ key: newDraftKey(), id: item.id, label: item.label }));
}

/**
 * Gives new items an id made from their words and keeps the ids of saved ones, because a
 * sign-off names the items seen by id: renaming an item must not make old sign-offs lose it.
 */
export function withChecklistIds(items: readonly Pick<ChecklistDraftItem, 'id' | 'label'>[]): ChecklistItem[] {
  const used = new Set(items.map((item) => item.id).filter(Boolean));
  return items.map((item) => {
    const label = item.label.trim();
    if (item.id) return { id: item.id, label };
    // Room for a "-NN" suffix inside the 60 characters an id may have.
    const base = checklistItemId(label).slice(0, 56).replace(/-+$/, '') || 'item';
    let id = base;
    for (let n = 2; used.has(id); n += 1) id = `${base}-${n}`;
    used.add(id);
    return { id, label };
  });
}

/** Moves one item up or down the list; a move past either end leaves the list as it is. */
export function moveItem<T>(items: readonly T[], index: number, by: -1 | 1): T[] {
  const target = index + by;
  if (index < 0 || index >= items.length || target < 0 || target >= items.length) return [...items];
  const next = [...items];
  const [item] = next.splice(index, 1);
  next.splice(target, 0, item as T);
  return next;
}
