import { machineCategories } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { usualSafetyItems } from './usual-safety-items';

describe('the usual safety items', () => {
  it('offers something for every kind of machine the shop can have', () => {
    for (const category of machineCategories) expect(usualSafetyItems[category].length).toBeGreaterThan(0);
  });

  it('reminds a lathe user to take the chuck key out', () => {
    // Common practice (lathe safety in machinist training manuals): remove the chuck key at once.
    expect(usualSafetyItems.lathe.some((item) => /chuck key/i.test(item))).toBe(true);
  });
});
