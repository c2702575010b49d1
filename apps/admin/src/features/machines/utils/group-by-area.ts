export interface AreaGroup<M> {
  area: string;
  machines: M[];
}

/**
 * Keeps the areas in the order the server lists them (the shop's own order of its rooms) and
 * sorts machines within an area by name, numbers read as numbers so that Lathe 2 precedes Lathe 10.
 */
export function groupByArea<M extends { area: string; name: string }>(machines: readonly M[]): AreaGroup<M>[] {
  const groups = new Map<string, M[]>();
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
