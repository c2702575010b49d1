import type { Knex } from 'knex';

const DAY = 86_400_000;

interface DemoTask {
  machine: string;
  name: string;
  instructions: string;
  everyHours: number | null;
  everyDays: number | null;
  blocking: boolean;
  /** The last time it was done: so many meter hours and days before the seed ran. */
  last: { hoursAgo: number; daysAgo: number; note: string };
}

const wayOil = (machine: string, hoursAgo: number, daysAgo: number): DemoTask => ({
  machine,
  name: 'Oil the ways',
  instructions: 'Way oil on the bed ways, cross-slide and compound through the oil points; wipe off the excess and old chips first.',
  everyHours: 8,
  everyDays: null,
  blocking: false,
  last: { hoursAgo, daysAgo, note: 'Ways oiled.' },
});

const headstockOil = (machine: string, hoursAgo: number, daysAgo: number): DemoTask => ({
  machine,
  name: 'Change the headstock oil',
  instructions: 'Drain the headstock warm, check the drained oil for metal, refill to the sight glass with the oil named on the machine card.',
  everyHours: 500,
  everyDays: null,
  // Running the gears on spent oil damages the machine, so it stops use once past due.
  blocking: true,
  last: { hoursAgo, daysAgo, note: 'Oil changed; no metal in the drained oil.' },
});

const linerAndTip = (machine: string, hoursAgo: number, daysAgo: number): DemoTask => ({
  machine,
  name: 'Check the liner and contact tip',
  instructions: 'Blow out the gun liner, check the drive rolls, and change the contact tip if its bore is worn oval or spattered.',
  everyHours: 40,
  everyDays: null,
  blocking: true,
  last: { hoursAgo, daysAgo, note: 'Liner blown out; tip changed.' },
});

const bladeTension = (machine: string, daysAgo: number): DemoTask => ({
  machine,
  name: 'Check the blade tension',
  instructions: 'Check the blade tension with the gauge, the guides for wear, and the blade for cracked or missing teeth.',
  everyHours: null,
  everyDays: 30,
  blocking: false,
  last: { hoursAgo: 0, daysAgo, note: 'Tension set; guides fine.' },
});

/**
 * The demo shop's maintenance. Lathe 1's way oil and Lathe 2's headstock oil are due soon, the
 * first MIG welder's liner check and the vertical band saw's blade check too; the knee mill's gib
 * adjustment is overdue but does not stop use. Nothing blocking is overdue, so the demo member
 * stays cleared wherever the demo takes them, and the blocking tasks are kept by meter hours only,
 * so they do not fall overdue while the demo shop sits unused.
 */
export const demoMaintenanceTasks: DemoTask[] = [
  wayOil('Lathe 1 · 13×40', 7.5, 2),
  headstockOil('Lathe 1 · 13×40', 333.5, 61),
  wayOil('Lathe 2 · 12×36', 3, 1),
  headstockOil('Lathe 2 · 12×36', 455, 80),
  wayOil('Lathe 3 · 14×40', 4, 3),
  headstockOil('Lathe 3 · 14×40', 264, 52),
  wayOil('Lathe 4 · 9×20 bench', 2.75, 6),
  headstockOil('Lathe 4 · 9×20 bench', 120, 70),
  {
    machine: 'Knee mill',
    name: 'Adjust the gibs',
    instructions: 'Check the table, saddle and knee for play with a dial indicator; snug the gib screws until the play is gone but the handwheels still turn freely.',
    everyHours: null,
    everyDays: 90,
    blocking: false,
    last: { hoursAgo: 60, daysAgo: 97, note: 'Saddle gib taken up a quarter turn.' },
  },
  linerAndTip('MIG welder 1', 37, 20),
  linerAndTip('MIG welder 2', 10, 9),
  bladeTension('Horizontal band saw', 12),
  bladeTension('Vertical band saw', 28),
];

/** How long before its last completion each task was set up, in days and meter hours. */
const SET_UP_BEFORE = { days: 30, hours: 20 };

export async function seed(knex: Knex): Promise<void> {
  const machines = await knex<{ id: string; name: string; meter_hours: string }>('machines').select('id', 'name', 'meter_hours');
  const byName = new Map(machines.map((m) => [m.name, m]));
  const instructor = await knex('members').first<{ id: string }>('id').where({ email: 'instructor@example.org' });
  const now = Date.now();
  for (const task of demoMaintenanceTasks) {
    const machine = byName.get(task.machine);
    if (!machine) throw new Error(`demo machine "${task.machine}" is missing`);
    const meter = Number(machine.meter_hours);
    const doneMeter = Math.round((meter - task.last.hoursAgo) * 100) / 100;
    const doneAt = new Date(now - task.last.daysAgo * DAY);
    const [row] = (await knex('maintenance_tasks')
      .insert({
        machine_id: machine.id,
        name: task.name,
        instructions: task.instructions,
        every_hours: task.everyHours,
        every_days: task.everyDays,
        blocking: task.blocking,
        start_meter_hours: Math.max(0, doneMeter - SET_UP_BEFORE.hours),
        created_at: new Date(doneAt.getTime() - SET_UP_BEFORE.days * DAY),
      })
      .returning('id')) as { id: string }[];
    if (!row) throw new Error('maintenance task insert returned no row');
    await knex('maintenance_completions').insert({ task_id: row.id, done_at: doneAt, meter_hours: doneMeter, done_by: instructor?.id ?? null, note: task.last.note });
  }
}
