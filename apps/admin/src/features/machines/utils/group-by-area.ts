import type { Machine } from '@chuckkey/core';

export interface AreaGroup {
  area: string;
  machines: Machine[];
}

/**
 * Keeps the areas in the order the server lists them (the shop's own order of its rooms) and
 * sorts machines within an area by name, numbers read as numbers so that Lathe 2 precedes Lathe 10.
 */
export function groupByArea(machines: readonly Machine[]): AreaGroup[] {
  const groups = new Map<string, Machine[]>();
  for (const machine of machines) {
    const group = groups.get(machine.area);
    if (group) group.push(machine);
    else groups.set(machine.area, [machine]);
  }
  const byName = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });
  return [...groups].map(([area, list]) => ({
    area,
    machines: [...list].sort((a, b) => byName.compare(a.name, b.name)),
  }));
}
