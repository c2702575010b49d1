import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { machineMaintenanceSchema, maintenanceDue, maintenanceTaskSchema, stationScanResultSchema, type MaintenanceTask } from '@chuckkey/core';
import { createMachine, createTraining } from '@chuckkey/db/factories';
import { signedIn, type TestContext } from '../../test/harness';
import { machineSessionsRepository } from '../machine-sessions/machine-sessions.repository';
import { badgeHolder, clearedOn, liveStationContext, pairedDevice } from '../station/station.fixtures';

let ctx: TestContext;
let changed: string[];
beforeAll(async () => {
  // Rule 4 needs a published waiver, which is shop-wide: this file keeps a database of its own.
  ({ ctx, changed } = await liveStationContext('maintenance'));
});
afterAll(() => ctx.close());

const DAY = 86_400_000;
const oilWays = { name: 'Oil the ways', instructions: 'Way oil on both ways and the cross-slide.', everyHours: 8, blocking: true };

async function addTask(machineId: string, body: object = oilWays): Promise<MaintenanceTask> {
  const res = await (await signedIn(ctx, 'admin')).post(`/api/machines/${machineId}/maintenance`, body);
  expect(res.status).toBe(201);
  return maintenanceTaskSchema.parse(res.body);
}

describe('POST /api/machines/:id/maintenance', () => {
  it('lets an admin add a task, counted from the machine’s meter now, and records it in the audit log', async () => {
    const machine = await createMachine(ctx.db, { meter_hours: 120.5 });
    const admin = await signedIn(ctx, 'admin');
    const res = await admin.post(`/api/machines/${machine.id}/maintenance`, { ...oilWays, name: '  Oil the ways  ' });

    expect(res.status).toBe(201);
    const task = maintenanceTaskSchema.parse(res.body);
    expect(task).toMatchObject({
      machine: { id: machine.id, name: machine.name, meterHours: 120.5 },
      name: 'Oil the ways',
      everyHours: 8,
      everyDays: null,
      blocking: true,
      active: true,
      status: 'ok',
      nextDueHours: 128.5,
      nextDueDate: null,
      lastDone: null,
    });
    const audit = await ctx.db('audit_log').first('actor_id', 'entity_id', 'details').where({ action: 'maintenance.task_created', entity_id: machine.id });
    expect(audit).toMatchObject({ actor_id: admin.member.id, details: { taskId: task.id, name: 'Oil the ways', everyHours: 8 } });
    expect(changed).toContain(machine.id);
  });

  it('needs hours or days, refuses a duplicate name on the machine, and knows no unknown machine', async () => {
    const machine = await createMachine(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const neither = await admin.post(`/api/machines/${machine.id}/maintenance`, { name: 'Check the belts' });
    expect(neither.status).toBe(400);
    expect(neither.body.errors.everyHours).toBeDefined();
    const fractional = await admin.post(`/api/machines/${machine.id}/maintenance`, { name: 'Check the belts', everyDays: 1.5 });
    expect(fractional.body.errors.everyDays).toBeDefined();

    await addTask(machine.id);
    const again = await admin.post(`/api/machines/${machine.id}/maintenance`, oilWays);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('maintenance_task_name_taken');

    const missing = await admin.post(`/api/machines/${randomUUID()}/maintenance`, oilWays);
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('machine_not_found');
  });

  it('is for admins only', async () => {
    const machine = await createMachine(ctx.db);
    for (const role of ['member', 'instructor'] as const) {
      const res = await (await signedIn(ctx, role)).post(`/api/machines/${machine.id}/maintenance`, oilWays);
      expect(res.status, role).toBe(403);
    }
  });
});

describe('PUT /api/maintenance/:id', () => {
  it('lets an admin change a task and make it inactive; an instructor may not', async () => {
    const machine = await createMachine(ctx.db);
    const task = await addTask(machine.id);
    const admin = await signedIn(ctx, 'admin');
    const res = await admin.put(`/api/maintenance/${task.id}`, { ...oilWays, everyHours: null, everyDays: 7, blocking: false, active: false });
    expect(res.status).toBe(200);
    expect(maintenanceTaskSchema.parse(res.body)).toMatchObject({ everyHours: null, everyDays: 7, blocking: false, active: false, nextDueHours: null });
    expect(await ctx.db('audit_log').first('details').where({ action: 'maintenance.task_updated', entity_id: machine.id })).toMatchObject({ details: { taskId: task.id, active: false } });

    expect((await (await signedIn(ctx, 'instructor')).put(`/api/maintenance/${task.id}`, oilWays)).status).toBe(403);
    expect((await admin.put(`/api/maintenance/${randomUUID()}`, oilWays)).body.code).toBe('maintenance_task_not_found');
  });
});

describe('GET /api/maintenance and GET /api/machines/:id/maintenance', () => {
  it('list active tasks with their status for instructors and admins, never for members', async () => {
    const machine = await createMachine(ctx.db, { meter_hours: 10 });
    const overdue = await addTask(machine.id);
    const inactive = await addTask(machine.id, { name: 'Retired check', everyDays: 30, active: false });
    await ctx.db('machines').where({ id: machine.id }).update({ meter_hours: 18.25 });

    const res = await (await signedIn(ctx, 'instructor')).get('/api/maintenance');
    expect(res.status).toBe(200);
    const list = maintenanceTaskSchema.array().parse(res.body);
    expect(list.find((t) => t.id === overdue.id)).toMatchObject({ status: 'overdue', nextDueHours: 18, machine: { meterHours: 18.25 } });
    expect(list.find((t) => t.id === inactive.id)).toBeUndefined();

    expect((await (await signedIn(ctx, 'member')).get('/api/maintenance')).status).toBe(403);
    expect((await (await signedIn(ctx, 'member')).get(`/api/machines/${machine.id}/maintenance`)).status).toBe(403);
  });

  it('shows one machine’s tasks, active or not, and its history newest first, never edited', async () => {
    const machine = await createMachine(ctx.db, { meter_hours: 50 });
    const task = await addTask(machine.id);
    await addTask(machine.id, { name: 'Retired check', everyDays: 30, active: false });
    const instructor = await signedIn(ctx, 'instructor');
    expect((await instructor.post(`/api/maintenance/${task.id}/complete`, { note: 'Ways were dry.' })).status).toBe(200);
    await ctx.db('machines').where({ id: machine.id }).update({ meter_hours: 53.5 });
    expect((await instructor.post(`/api/maintenance/${task.id}/complete`, {})).status).toBe(200);

    const res = await instructor.get(`/api/machines/${machine.id}/maintenance`);
    expect(res.status).toBe(200);
    const view = machineMaintenanceSchema.parse(res.body);
    expect(view.tasks.map((t) => t.name)).toEqual(['Oil the ways', 'Retired check']);
    expect(view.history.map((h) => [h.meterHours, h.note])).toEqual([
      [53.5, ''],
      [50, 'Ways were dry.'],
    ]);
    expect(view.history[0]?.doneBy).toEqual({ id: instructor.member.id, name: expect.any(String) });

    // The database keeps history as written (the completions table's trigger).
    await expect(ctx.db('maintenance_completions').where({ task_id: task.id }).update({ note: 'changed' })).rejects.toThrow(/never edited/);
    expect((await instructor.get(`/api/machines/${randomUUID()}/maintenance`)).status).toBe(404);
  });
});

describe('POST /api/maintenance/:id/complete', () => {
  it('records the meter now, counts the next due from it, and is audited', async () => {
    const machine = await createMachine(ctx.db, { meter_hours: 0 });
    const task = await addTask(machine.id, { ...oilWays, everyHours: 40 });
    // The meter ran past two intervals before anyone did the work.
    await ctx.db('machines').where({ id: machine.id }).update({ meter_hours: 95.5 });
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post(`/api/maintenance/${task.id}/complete`, { note: '  Liner blown out, tip changed.  ' });

    expect(res.status).toBe(200);
    // Due again a full interval after the completion's reading, not at the next multiple (120 h).
    expect(maintenanceTaskSchema.parse(res.body)).toMatchObject({ status: 'ok', nextDueHours: 135.5, lastDone: { meterHours: 95.5 } });
    expect(await ctx.db('audit_log').first('actor_id', 'details').where({ action: 'maintenance.completed', entity_id: machine.id })).toMatchObject({
      actor_id: instructor.member.id,
      details: { taskId: task.id, taskName: 'Oil the ways', meterHours: 95.5, note: 'Liner blown out, tip changed.' },
    });
  });

  it('is for instructors and admins, about a task that exists', async () => {
    const machine = await createMachine(ctx.db);
    const task = await addTask(machine.id);
    expect((await (await signedIn(ctx, 'member')).post(`/api/maintenance/${task.id}/complete`, { note: 'Done.' })).status).toBe(403);
    const admin = await signedIn(ctx, 'admin');
    expect((await admin.post(`/api/maintenance/${randomUUID()}/complete`, { note: 'Done.' })).status).toBe(404);
    const long = await admin.post(`/api/maintenance/${task.id}/complete`, { note: 'x'.repeat(1001) });
    expect(long.status).toBe(400);
    expect(long.body.errors.note).toBeDefined();
  });
});

describe('rule 4: overdue blocking maintenance at the station', () => {
  async function clearedLathe() {
    const paired = await pairedDevice(ctx);
    await ctx.db('machines').where({ id: paired.machine.id }).update({ meter_hours: 200 });
    const training = await createTraining(ctx.db, { name: `Lathe basics ${randomUUID().slice(0, 6)}`, machine_ids: [paired.machine.id] });
    const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Bettina' });
    const member = await badgeHolder(ctx, 'member', { firstName: 'Ines' });
    await clearedOn(ctx, member, training.id, teacher.member.id);
    return { ...paired, member };
  }

  const scan = async (device: Awaited<ReturnType<typeof clearedLathe>>['device'], badge: string) =>
    stationScanResultSchema.parse((await device.post('/api/station/scan', { badge })).body);

  it('an overdue blocking task refuses a cleared member, naming the task; marking it done clears them', async () => {
    const { admin, device, machine, member } = await clearedLathe();
    const task = await addTask(machine.id, { name: 'Change the headstock oil', everyHours: 500, blocking: true });
    expect((await scan(device, member.badge)).cleared).toBe(true);

    await ctx.db('machines').where({ id: machine.id }).update({ meter_hours: 700.01 });
    const refused = await scan(device, member.badge);
    expect(refused.cleared).toBe(false);
    expect(refused.reasons).toEqual([
      expect.objectContaining({ code: 'maintenance_overdue', rule: 4, message: `Maintenance is overdue on ${machine.name}: Change the headstock oil.` }),
    ]);

    expect((await admin.post(`/api/maintenance/${task.id}/complete`, { note: 'Oil changed.' })).status).toBe(200);
    expect((await scan(device, member.badge)).cleared).toBe(true);
  });

  it('an overdue task that is not blocking, or not active, does not refuse', async () => {
    const { device, machine, member } = await clearedLathe();
    await addTask(machine.id, { name: 'Wipe down the ways', everyHours: 8, blocking: false });
    await addTask(machine.id, { name: 'Old headstock check', everyHours: 8, blocking: true, active: false });
    await ctx.db('machines').where({ id: machine.id }).update({ meter_hours: 300 });
    expect((await scan(device, member.badge)).cleared).toBe(true);
  });

  it('the scan statement finds overdue exactly where core’s maintenanceDue says so', async () => {
    // Cases from a fixed-seed generator around the limits: meters a hundredth either side of the
    // due reading, and instants on either side of midnight in a zone with daylight saving
    // (America/Chicago leaves it on 1 November 2026: IANA time zone database through Intl).
    const timeZone = 'America/Chicago';
    const previous = (await ctx.db('shop').first('time_zone').where({ id: 1 })) as { time_zone: string };
    await ctx.db('shop').where({ id: 1 }).update({ time_zone: timeZone });
    let seed = 20261205;
    const next = (n: number) => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed % n;
    };
    const repository = machineSessionsRepository(ctx.db);
    const mismatches: string[] = [];
    let overdueCases = 0;
    try {
      for (let i = 0; i < 48; i += 1) {
        const everyHours = [null, 8, 40, 500][next(4)] ?? null;
        const everyDays = everyHours === null ? ([1, 30, 90][next(3)] ?? 30) : ([null, 1, 30][next(3)] ?? null);
        const startMeterHours = next(100_000) / 100;
        const createdAt = new Date(Date.UTC(2026, 9, 20) + next(40 * 24 * 60) * 60_000);
        const done = next(2) === 1 ? { doneAt: new Date(createdAt.getTime() + next(10 * 24 * 60) * 60_000), meterHours: startMeterHours + next(2000) / 100 } : null;
        const base = done ? done.meterHours : startMeterHours;
        const meterHours = Math.round((base + (everyHours ?? 10) + [-0.01, 0, 0.01, next(2000) / 100 - 10][next(4)]!) * 100) / 100;
        const from = done ? done.doneAt : createdAt;
        const now = new Date(from.getTime() + ((everyDays ?? 1) - 1) * DAY + next(3 * 24 * 60) * 60_000);

        const machine = await createMachine(ctx.db, { meter_hours: Math.max(meterHours, 0) });
        const [task] = (await ctx
          .db('maintenance_tasks')
          .insert({ machine_id: machine.id, name: `Case ${i}`, every_hours: everyHours, every_days: everyDays, blocking: true, start_meter_hours: startMeterHours, created_at: createdAt })
          .returning('id')) as { id: string }[];
        if (done) await ctx.db('maintenance_completions').insert({ task_id: task!.id, done_at: done.doneAt, meter_hours: done.meterHours });

        const schedule = { everyHours, everyDays, startMeterHours, createdAt };
        const expected = maintenanceDue(schedule, done, Math.max(meterHours, 0), now, timeZone).status === 'overdue';
        const facts = await repository.facts(machine.id, null, now);
        const found = (facts?.overdueBlockingTasks.length ?? 0) > 0;
        if (expected) overdueCases += 1;
        if (found !== expected) mismatches.push(JSON.stringify({ schedule, done, meterHours, now, expected, found }));
      }
    } finally {
      await ctx.db('shop').where({ id: 1 }).update({ time_zone: previous.time_zone });
    }
    expect(mismatches).toEqual([]);
    // The cases must land on both sides of the limits for the comparison to say anything.
    expect(overdueCases).toBeGreaterThan(5);
    expect(overdueCases).toBeLessThan(43);
  });
});
