import type { Machine } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { groupByArea } from './group-by-area';

let next = 0;
function machine(name: string, area: string): Machine {
  next += 1;
  return {
    id: `00000000-0000-4000-8000-${String(next).padStart(12, '0')}`,
    name,
    category: 'lathe',
    area,
    reservable: true,
    meterHours: 0,
  };
}

describe('groupByArea', () => {
  it('keeps the areas in the order the shop lists them', () => {
    const groups = groupByArea([machine('Knee mill', 'Milling'), machine('Lathe 1', 'Turning'), machine('Drill press', 'Milling')]);

    expect(groups.map((group) => group.area)).toEqual(['Milling', 'Turning']);
    expect(groups[0]?.machines.map((m) => m.name)).toEqual(['Drill press', 'Knee mill']);
  });

  it('puts Lathe 2 before Lathe 10', () => {
    const groups = groupByArea([machine('Lathe 10', 'Turning'), machine('Lathe 2', 'Turning'), machine('Lathe 1', 'Turning')]);

    expect(groups[0]?.machines.map((m) => m.name)).toEqual(['Lathe 1', 'Lathe 2', 'Lathe 10']);
  });

  it('gives no groups for a shop without machines', () => {
    expect(groupByArea([])).toEqual([]);
  });
});
