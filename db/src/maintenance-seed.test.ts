import { describe, expect, it } from 'vitest';
import { maintenanceDue } from '@chuckkey/core';
import { demoMaintenanceTasks } from '../seeds/12_maintenance';
import { ownDatabase } from './test-database';

const own = ownDatabase('maintenance_seed', { seed: true });

async function statuses() {
  const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
  const rows = await own
    .db('maintenance_tasks as t')
    .join('machines as m', 'm.id', 't.machine_id')
    .joinRaw('left join lateral (select c.done_at, c.meter_hours from maintenance_completions c where c.task_id = t.id order by c.done_at desc limit 1) last on true')
    .select('m.name as machine', 'm.category', 't.name', 't.blocking', 't.every_hours', 't.every_days', 't.start_meter_hours', 't.created_at', 'm.meter_hours', 'last.done_at', 'last.meter_hours as last_meter');
  const now = new Date();
  return rows.map((r) => ({
    machine: r.machine as string,
    category: r.category as string,
    name: r.name as string,
    blocking: r.blocking as boolean,
    status: maintenanceDue(
      { everyHours: r.every_hours, everyDays: r.every_days, startMeterHours: Number(r.start_meter_hours), createdAt: r.created_at },
      r.done_at ? { doneAt: r.done_at, meterHours: Number(r.last_meter) } : null,
      Number(r.meter_hours),
      now,
      timeZone,
    ).status,
  }));
}

describe('the demo shop’s maintenance', () => {
  it('keeps every demo task with its last completion', async () => {
    const tasks = await own.db('maintenance_tasks').count<{ count: string }>({ count: '*' }).first();
    const done = await own.db('maintenance_completions').count<{ count: string }>({ count: '*' }).first();
    expect(Number(tasks?.count)).toBe(demoMaintenanceTasks.length);
    expect(Number(done?.count)).toBe(demoMaintenanceTasks.length);
  });

  it('has tasks due soon and one overdue that does not block, and nothing blocking overdue', async () => {
    const all = await statuses();
    expect(all.filter((t) => t.status === 'due').length).toBeGreaterThanOrEqual(2);
    expect(all.filter((t) => t.status === 'overdue')).toEqual([expect.objectContaining({ machine: 'Knee mill', name: 'Adjust the gibs', blocking: false })]);
    // The demo member must stay cleared on the lathes and band saws (rule 4).
    expect(all.filter((t) => t.blocking && t.status === 'overdue')).toEqual([]);
  });

  it('oils each lathe’s ways every 8 h and changes its headstock oil every 500 h', async () => {
    const lathes = await own.db('machines').where({ category: 'lathe' }).pluck('id');
    for (const id of lathes) {
      const tasks = await own.db('maintenance_tasks').where({ machine_id: id }).orderBy('name').select('name', 'every_hours', 'blocking');
      expect(tasks).toEqual([
        { name: 'Change the headstock oil', every_hours: 500, blocking: true },
        { name: 'Oil the ways', every_hours: 8, blocking: false },
      ]);
    }
  });
});
