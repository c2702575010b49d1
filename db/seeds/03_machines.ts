import type { Knex } from 'knex';
import type { MachineCategory } from '@chuckkey/core';
import { createMachine } from '../factories';

export const demoMachines: { name: string; category: MachineCategory; area: string; reservable: boolean; meter_hours: number }[] = [
  { name: 'Lathe 1 · 13×40', category: 'lathe', area: 'Turning bay', reservable: true, meter_hours: 1843.5 },
  { name: 'Lathe 2 · 12×36', category: 'lathe', area: 'Turning bay', reservable: true, meter_hours: 2210.25 },
  { name: 'Lathe 3 · 14×40', category: 'lathe', area: 'Turning bay', reservable: true, meter_hours: 964 },
  { name: 'Lathe 4 · 9×20 bench', category: 'lathe', area: 'Turning bay', reservable: false, meter_hours: 412.75 },
  { name: 'Knee mill', category: 'mill', area: 'Milling & drilling', reservable: true, meter_hours: 3120.5 },
  { name: 'Drill press', category: 'drill_press', area: 'Milling & drilling', reservable: false, meter_hours: 1502 },
  { name: 'MIG welder 1', category: 'mig_welder', area: 'Welding bay', reservable: true, meter_hours: 688.25 },
  { name: 'MIG welder 2', category: 'mig_welder', area: 'Welding bay', reservable: true, meter_hours: 540 },
  { name: 'TIG welder', category: 'tig_welder', area: 'Welding bay', reservable: true, meter_hours: 377.5 },
  { name: 'Horizontal band saw', category: 'band_saw', area: 'Cutting & grinding', reservable: false, meter_hours: 905 },
  { name: 'Vertical band saw', category: 'band_saw', area: 'Cutting & grinding', reservable: false, meter_hours: 611.75 },
  { name: 'Surface grinder', category: 'surface_grinder', area: 'Cutting & grinding', reservable: true, meter_hours: 233 },
];

export async function seed(knex: Knex): Promise<void> {
  const areas = await knex<{ id: string; name: string }>('areas').select('id', 'name');
  const areaId = new Map(areas.map((a) => [a.name, a.id]));
  for (const { area, ...machine } of demoMachines) {
    const id = areaId.get(area);
    if (!id) throw new Error(`demo area "${area}" is missing`);
    await createMachine(knex, { ...machine, area_id: id });
  }
}
