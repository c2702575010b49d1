import { checklistSchema } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { moveItem, withChecklistIds } from './checklist';

describe('withChecklistIds', () => {
  it('keeps the id of an item that was saved before, even when its words change', () => {
    expect(withChecklistIds([{ id: 'removes-the-chuck-key', label: 'Takes the chuck key out at once' }])).toEqual([
      { id: 'removes-the-chuck-key', label: 'Takes the chuck key out at once' },
    ]);
  });

  it('makes an id for a new item from its words', () => {
    expect(withChecklistIds([{ id: '', label: '  Stops the spindle before measuring ' }])).toEqual([
      { id: 'stops-the-spindle-before-measuring', label: 'Stops the spindle before measuring' },
    ]);
  });

  it('never gives two items the same id', () => {
    const items = withChecklistIds([
      { id: 'wears-eye-protection', label: 'Wears eye protection' },
      { id: '', label: 'Wears eye protection' },
      { id: '', label: 'Wears eye protection!' },
    ]);

    expect(items.map((item) => item.id)).toEqual(['wears-eye-protection', 'wears-eye-protection-2', 'wears-eye-protection-3']);
  });

  it('makes ids the server accepts, however long or odd the words', () => {
    const items = withChecklistIds([
      { id: '', label: 'Checks '.repeat(25) },
      { id: '', label: 'Checks '.repeat(25) },
      { id: '', label: '¿¡?' },
    ]);

    expect(checklistSchema.safeParse(items).success).toBe(true);
    expect(items.every((item) => item.id.length <= 60)).toBe(true);
  });
});

describe('moveItem', () => {
  it('moves an item one place up or down', () => {
    expect(moveItem(['a', 'b', 'c'], 2, -1)).toEqual(['a', 'c', 'b']);
    expect(moveItem(['a', 'b', 'c'], 0, 1)).toEqual(['b', 'a', 'c']);
  });

  it('leaves the list alone at either end', () => {
    expect(moveItem(['a', 'b'], 0, -1)).toEqual(['a', 'b']);
    expect(moveItem(['a', 'b'], 1, 1)).toEqual(['a', 'b']);
  });
});
