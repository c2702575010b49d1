import type { Station } from '@chuckkey/core';

export interface MachineChoice {
  id: string;
  label: string;
}

const byName = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

/**
 * The machines a new station can stand at, by name. Those with a working station are marked,
 * since a replacement tablet is better paired with its station's new code than given a second station.
 */
export function machineChoices(machines: readonly { id: string; name: string }[], stations: readonly Station[]): MachineChoice[] {
  const equipped = new Set(stations.flatMap((station) => (station.machine && !station.revokedAt ? [station.machine.id] : [])));
  return [...machines]
    .sort((a, b) => byName.compare(a.name, b.name))
    .map((machine) => ({ id: machine.id, label: equipped.has(machine.id) ? `${machine.name} (has a station)` : machine.name }));
}
