import { randomUUID } from 'node:crypto';
import ICAL from 'ical.js';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
  availabilitySchema,
  boardSchema,
  calendarFeedCreatedSchema,
  classListSchema,
  classSchema,
  myReservationsSchema,
  stationScanResultSchema,
  wallClockInstant,
  type ClassDetail,
} from '@chuckkey/core';
import { createMachine, createSignOff, createTraining, createWaiverVersion, recordWaiver } from '@chuckkey/db/factories';
import { createTestContext, ownDatabase, signedIn, type TestContext } from '../../test/harness';
import { badgeHolder, pairedBoard, pairedDevice, type BadgeHolder } from '../station/station.fixtures';

const TIME_ZONE = 'America/Chicago';

// The shop's time zone and opening hours are shop-wide, so these tests run on a database of their own.
let ctx: TestContext;
beforeAll(async () => {
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('classes') });
  await ctx.db('shop').where({ id: 1 }).update({ time_zone: TIME_ZONE });
  await createWaiverVersion(ctx.db);
});
afterAll(() => ctx.close());
beforeEach(async () => {
  await ctx.db('shop_hours').delete();
  await ctx.db('shop_closures').delete();
});

const MINUTE = 60_000;
const DAY = 86_400_000;

/** The shop's calendar date `days` after today, 'YYYY-MM-DD', as the IANA tz database through Intl gives it. */
function shopDay(days: number): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone: TIME_ZONE, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date(Date.now() + days * DAY));
}

/** 'Saturday 09:00' of an instant on the shop's wall clock, as the IANA tz database through Intl gives it. */
function wallClock(instant: Date | string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone: TIME_ZONE, weekday: 'long', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(instant));
}

const at = (days: number, clock: string) => wallClockInstant(shopDay(days), clock, TIME_ZONE);

function classBody(machineId: string, start: Date, end: Date, extra: Record<string, unknown> = {}) {
  return { machineId, title: `Lathe class ${randomUUID().slice(0, 6)}`, start: start.toISOString(), end: end.toISOString(), ...extra };
}

async function created(res: { status: number; body: unknown }): Promise<ClassDetail> {
  expect(res.status).toBe(201);
  return classSchema.parse(res.body);
}

describe('POST /api/classes', () => {
  it('an instructor holds a machine once: 201 with the class, one class hold held by them, and an audit entry', async () => {
    const machine = await createMachine(ctx.db, { category: 'lathe' });
    const training = await createTraining(ctx.db, { machine_ids: [machine.id] });
    const instructor = await signedIn(ctx, 'instructor', { first_name: 'Halvard' });
    const member = await signedIn(ctx, 'member', { first_name: 'Odile', last_name: 'Marchetti' });
    const start = at(3, '18:00');
    const end = at(3, '21:00');

    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, start, end, { trainingId: training.id, capacity: 4, memberIds: [member.member.id] })));

    expect(cls).toMatchObject({
      machineId: machine.id,
      machineName: machine.name,
      trainingId: training.id,
      trainingName: training.name,
      instructor: { id: instructor.member.id, firstName: 'Halvard' },
      weeks: 1,
      rrule: null,
      capacity: 4,
      members: [{ id: member.member.id, firstName: 'Odile', lastName: 'Marchetti' }],
      memberCount: 1,
      booked: false,
    });
    expect(cls.occurrences).toEqual([{ reservationId: expect.any(String), startsAt: start.toISOString(), endsAt: end.toISOString(), status: 'active' }]);
    const rows = await ctx.db('reservations').where({ class_id: cls.id }).select('kind', 'member_id', 'machine_id');
    expect(rows).toEqual([{ kind: 'class', member_id: instructor.member.id, machine_id: machine.id }]);
    const audit = await ctx.db('audit_log').where({ action: 'class.created', entity_id: cls.id }).select('actor_id');
    expect(audit).toEqual([{ actor_id: instructor.member.id }]);
  });

  it('a weekly class gets one hold per week and its RRULE (RFC 5545 §3.3.10)', async () => {
    const machine = await createMachine(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const cls = await created(await admin.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { weeks: 4 })));

    expect(cls.rrule).toBe('FREQ=WEEKLY;COUNT=4');
    const availability = await admin.get(`/api/machines/${machine.id}/availability?from=${encodeURIComponent(at(1, '00:00').toISOString())}&to=${encodeURIComponent(at(10, '00:00').toISOString())}`);
    expect(availabilitySchema.parse(availability.body).taken).toEqual(
      cls.occurrences.slice(0, 2).map((o) => ({ start: o.startsAt, end: o.endsAt, blockedUntil: o.endsAt, kind: 'class', title: cls.title })),
    );
    expect(cls.occurrences).toHaveLength(4);
    expect(cls.occurrences.map((o) => wallClock(o.startsAt))).toEqual(Array(4).fill(wallClock(at(2, '10:00'))));
    expect(await ctx.db('reservations').where({ class_id: cls.id, status: 'active' }).count({ n: '*' })).toEqual([{ n: 4 }]);
  });

  it('a weekly class over the November change keeps its 9:00 local start (IANA tz database via Intl)', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    // The next first Sunday of November: US daylight saving time ends then (from memory of the 2007 US rule; Intl checks the offsets below).
    const now = new Date();
    let year = now.getUTCFullYear();
    const firstSunday = (y: number) => {
      const date = new Date(Date.UTC(y, 10, 1));
      while (date.getUTCDay() !== 0) date.setUTCDate(date.getUTCDate() + 1);
      return date;
    };
    if (firstSunday(year).getTime() - 8 * DAY <= now.getTime()) year += 1;
    const change = firstSunday(year);
    const saturdayBefore = new Date(change.getTime() - 8 * DAY).toISOString().slice(0, 10);
    const start = wallClockInstant(saturdayBefore, '09:00', TIME_ZONE);
    const end = wallClockInstant(saturdayBefore, '11:00', TIME_ZONE);

    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, start, end, { weeks: 3 })));

    const starts = cls.occurrences.map((o) => o.startsAt);
    expect(starts.map(wallClock)).toEqual(['Saturday 09:00', 'Saturday 09:00', 'Saturday 09:00']);
    expect(cls.occurrences.map((o) => wallClock(o.endsAt))).toEqual(['Saturday 11:00', 'Saturday 11:00', 'Saturday 11:00']);
    // IANA tz database via Intl: CDT is UTC−5 before the change, CST UTC−6 after it, so the last meeting is a week and an hour after the second.
    expect(new Date(starts[2]!).getTime() - new Date(starts[1]!).getTime()).toBe(7 * DAY + 60 * MINUTE);
    expect(new Date(starts[1]!).getTime() - new Date(starts[0]!).getTime()).toBe(7 * DAY);
  });

  it('refuses the whole weekly class with 409 overlap naming the clashing meeting when a member holds part of it, and stores nothing', async () => {
    const machine = await createMachine(ctx.db);
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const title = `Clashing class ${randomUUID().slice(0, 6)}`;
    const secondWeek = at(9, '10:00');
    await ctx.db('reservations').insert({ machine_id: machine.id, member_id: member.member.id, starts_at: new Date(secondWeek.getTime() + 30 * MINUTE), ends_at: new Date(secondWeek.getTime() + 90 * MINUTE), blocked_until: new Date(secondWeek.getTime() + 90 * MINUTE) });

    const res = await instructor.post('/api/classes', { ...classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { weeks: 3 }), title });

    expect(res.status).toBe(409);
    // RFC 9457 §3.2: the meeting refused travels as an extension member.
    expect(res.body).toMatchObject({ code: 'overlap', occurrence: secondWeek.toISOString() });
    const date = new Intl.DateTimeFormat('en-GB', { timeZone: TIME_ZONE, day: 'numeric', month: 'long' }).format(secondWeek);
    expect(res.body.detail).toContain(date);
    expect(await ctx.db('classes').where({ title }).count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(await ctx.db('reservations').where({ machine_id: machine.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('answers 409 outside_hours for a meeting on a closure, naming it', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    await ctx.db('shop_closures').insert({ starts_on: shopDay(16), ends_on: shopDay(16), reason: 'Floor resurfacing' });
    const start = at(2, '10:00');

    const res = await instructor.post('/api/classes', classBody(machine.id, start, at(2, '12:00'), { weeks: 3 }));

    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'outside_hours', occurrence: at(16, '10:00').toISOString() });
    expect(res.body.detail).toContain('Floor resurfacing');
  });

  it('refuses a member with 403, and bad input with 400', async () => {
    const machine = await createMachine(ctx.db);
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');

    expect((await member.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00')))).status).toBe(403);
    const backwards = await instructor.post('/api/classes', classBody(machine.id, at(2, '12:00'), at(2, '10:00')));
    expect([backwards.status, Object.keys(backwards.body.errors)]).toEqual([400, ['end']]);
    const tooMany = await instructor.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { weeks: 27 }));
    expect([tooMany.status, Object.keys(tooMany.body.errors)]).toEqual([400, ['weeks']]);
    const past = await instructor.post('/api/classes', classBody(machine.id, new Date(Date.now() - 60 * MINUTE), new Date(Date.now() + 60 * MINUTE)));
    expect([past.status, past.body.code]).toEqual([400, 'in_the_past']);
    const unknown = await instructor.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { memberIds: [randomUUID()] }));
    expect([unknown.status, unknown.body.code]).toEqual([400, 'member_not_found']);
  });
});

describe('reading classes', () => {
  it('GET /api/classes gives members whether they are booked and the count, and instructors the names', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    const booked = await signedIn(ctx, 'member');
    const other = await signedIn(ctx, 'member');
    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, at(4, '10:00'), at(4, '12:00'), { weeks: 2, memberIds: [booked.member.id] })));

    const seen = classListSchema.parse((await booked.get('/api/classes')).body).classes.find((c) => c.id === cls.id);
    expect(seen).toMatchObject({ booked: true, memberCount: 1 });
    expect(seen).not.toHaveProperty('members');
    expect(seen?.occurrences).toHaveLength(2);
    expect(classListSchema.parse((await other.get('/api/classes')).body).classes.find((c) => c.id === cls.id)).toMatchObject({ booked: false, memberCount: 1 });
    const asInstructor = classSchema.parse((await instructor.get(`/api/classes/${cls.id}`)).body);
    expect(asInstructor.members?.map((m) => m.id)).toEqual([booked.member.id]);

    const firstWeekOnly = classListSchema.parse((await booked.get(`/api/classes?from=${encodeURIComponent(at(3, '00:00').toISOString())}&to=${encodeURIComponent(at(6, '00:00').toISOString())}`)).body);
    expect(firstWeekOnly.classes.find((c) => c.id === cls.id)?.occurrences).toHaveLength(1);
    expect((await booked.get(`/api/classes/${randomUUID()}`)).status).toBe(404);
  });

  it('PUT /api/classes/:id/members replaces the members, refusing more than the capacity and unknown members with 400', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    const [a, b, c] = await Promise.all([signedIn(ctx, 'member'), signedIn(ctx, 'member'), signedIn(ctx, 'member')]);
    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, at(5, '10:00'), at(5, '12:00'), { capacity: 2, memberIds: [a!.member.id] })));

    const changed = await instructor.put(`/api/classes/${cls.id}/members`, { memberIds: [b!.member.id, c!.member.id] });
    expect(changed.status).toBe(200);
    expect(classSchema.parse(changed.body).members?.map((m) => m.id).sort()).toEqual([b!.member.id, c!.member.id].sort());
    const audit = await ctx.db('audit_log').first('details').where({ action: 'class.members_changed', entity_id: cls.id });
    expect(audit.details).toEqual({ added: [b!.member.id, c!.member.id], removed: [a!.member.id] });

    const over = await instructor.put(`/api/classes/${cls.id}/members`, { memberIds: [a!.member.id, b!.member.id, c!.member.id] });
    expect([over.status, over.body.code]).toEqual([400, 'over_capacity']);
    const unknown = await instructor.put(`/api/classes/${cls.id}/members`, { memberIds: [randomUUID()] });
    expect([unknown.status, unknown.body.code]).toEqual([400, 'member_not_found']);
    expect((await a!.put(`/api/classes/${cls.id}/members`, { memberIds: [] })).status).toBe(403);
  });
});

describe('members booked into a class', () => {
  it('see its meetings in /api/reservations/mine and in their calendar feed, and cannot cancel them there', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    const member = await signedIn(ctx, 'member');
    const title = `Sign-off class ${randomUUID().slice(0, 6)}`;
    const cls = await created(await instructor.post('/api/classes', { ...classBody(machine.id, at(3, '10:00'), at(3, '12:00'), { weeks: 2, memberIds: [member.member.id] }), title }));

    const mine = myReservationsSchema.parse((await member.get('/api/reservations/mine')).body);
    expect(mine.upcoming.map((r) => [r.id, r.kind, r.classTitle, r.machineName])).toEqual(cls.occurrences.map((o) => [o.reservationId, 'class', title, machine.name]));
    const first = cls.occurrences[0]!.reservationId;
    expect((await member.delete(`/api/reservations/${first}`)).status).toBe(404);
    expect((await instructor.delete(`/api/reservations/${first}`)).body.code).toBe('class_meeting');

    const { url } = calendarFeedCreatedSchema.parse((await member.post('/api/profile/calendar-feed')).body);
    const feed = await request(ctx.app).get(new URL(url).pathname);
    expect(feed.status).toBe(200);
    const events = new ICAL.Component(ICAL.parse(feed.text)).getAllSubcomponents('vevent').map((event) => ({
      uid: event.getFirstPropertyValue('uid'),
      summary: event.getFirstPropertyValue('summary'),
    }));
    // RFC 5545 §3.8.4.7: each meeting has its own stable UID; §3.8.1.12: SUMMARY names the class.
    expect(events).toEqual(cls.occurrences.map((o) => ({ uid: `${o.reservationId}@chuckkey`, summary: `${title} (${machine.name})` })));
  });
});

describe('rule 6 and the next class at the scan', () => {
  async function cleared(holder: BadgeHolder, trainingId: string, signedBy: string) {
    const current = await ctx.db('waiver_versions').max<{ max: number }>({ max: 'version' }).first();
    await recordWaiver(ctx.db, { memberId: holder.member.id, version: Number(current?.max) });
    await createSignOff(ctx.db, { member_id: holder.member.id, training_id: trainingId, signed_by: signedBy, level: 'independent' });
  }

  async function scan(device: Awaited<ReturnType<typeof pairedDevice>>['device'], badge: string) {
    const res = await device.post('/api/station/scan', { badge });
    expect(res.status).toBe(200);
    return stationScanResultSchema.parse(res.body);
  }

  it('a member booked into the class is not kept off by its hold, another member is, and an unsigned member hears when the next class is', async () => {
    const { device, machine } = await pairedDevice(ctx);
    const training = await createTraining(ctx.db, { name: `Lathe fundamentals ${randomUUID().slice(0, 6)}`, machine_ids: [machine.id] });
    const teacher = await badgeHolder(ctx, 'instructor', { firstName: 'Halvard' });
    const booked = await badgeHolder(ctx, 'member', { firstName: 'Odile' });
    const other = await badgeHolder(ctx, 'member', { firstName: 'Jonas' });
    const unsigned = await badgeHolder(ctx, 'member', { firstName: 'Ruth' });
    await cleared(booked, training.id, teacher.member.id);
    await cleared(other, training.id, teacher.member.id);
    await cleared(unsigned, training.id, teacher.member.id);
    await ctx.db('sign_offs').where({ member_id: unsigned.member.id }).delete();
    const instructor = await signedIn(ctx, 'instructor');
    const start = new Date(Math.ceil((Date.now() + 5 * MINUTE) / MINUTE) * MINUTE);
    const cls = await created(
      await instructor.post('/api/classes', classBody(machine.id, start, new Date(start.getTime() + 120 * MINUTE), { trainingId: training.id, weeks: 2, memberIds: [booked.member.id] })),
    );

    // product.md, rule 6: a reservation of one's own does not keep one off; the class's is its members' own.
    expect((await scan(device, booked.badge)).cleared).toBe(true);
    const refused = await scan(device, other.badge);
    expect(refused.reasons.map((r) => r.code)).toEqual(['reservation_soon']);

    // product.md: "not cleared" says when the next class is; the first meeting has not started yet.
    const missing = (await scan(device, unsigned.badge)).reasons.find((r) => r.code === 'sign_off_missing');
    expect(missing?.nextStep).toMatch(/the next class is/);
    expect(cls.occurrences).toHaveLength(2);
  });
});

describe('the wall board and cancelling', () => {
  it('the board lists the coming class meetings with their titles', async () => {
    const machine = await createMachine(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');
    const title = `Board class ${randomUUID().slice(0, 6)}`;
    const start = at(1, '11:00');
    const cls = await created(await instructor.post('/api/classes', { ...classBody(machine.id, start, at(1, '13:00'), { weeks: 3 }), title }));
    const { device } = await pairedBoard(ctx);

    const board = boardSchema.parse((await device.get('/api/board')).body);

    // Today and the next seven days: the first two weekly meetings at most, never the third.
    const listed = board.classes.filter((c) => c.classId === cls.id);
    expect(listed.length).toBeGreaterThanOrEqual(1);
    expect(listed[0]).toEqual({ id: cls.occurrences[0]!.reservationId, classId: cls.id, name: title, startsAt: start.toISOString(), machineName: machine.name });
    expect(listed.map((c) => c.id)).not.toContain(cls.occurrences[2]!.reservationId);
    expect(board.classes.length).toBeLessThanOrEqual(6);
  });

  it('cancelling the class frees its time: a member can then reserve a slot in it', async () => {
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    const instructor = await signedIn(ctx, 'instructor');
    const member = await signedIn(ctx, 'member');
    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { weeks: 2 })));
    const slot = { machineId: machine.id, start: at(2, '10:30').toISOString(), end: at(2, '11:30').toISOString() };
    expect((await member.post('/api/reservations', slot)).body.code).toBe('overlap');

    expect((await member.delete(`/api/classes/${cls.id}`)).status).toBe(403);
    const other = await signedIn(ctx, 'instructor');
    expect((await other.delete(`/api/classes/${cls.id}`)).body.code).toBe('not_yours');
    expect((await instructor.delete(`/api/classes/${cls.id}`)).status).toBe(204);

    const after = classSchema.parse((await instructor.get(`/api/classes/${cls.id}`)).body);
    expect(after.cancelledAt).not.toBeNull();
    expect(after.occurrences.map((o) => o.status)).toEqual(['cancelled', 'cancelled']);
    expect((await member.post('/api/reservations', slot)).status).toBe(201);
    expect(await ctx.db('audit_log').where({ action: 'class.cancelled', entity_id: cls.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('cancelling one meeting frees that week alone', async () => {
    const machine = await createMachine(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const instructor = await signedIn(ctx, 'instructor');
    const cls = await created(await instructor.post('/api/classes', classBody(machine.id, at(2, '10:00'), at(2, '12:00'), { weeks: 2 })));
    const [first, second] = cls.occurrences;

    expect((await admin.delete(`/api/classes/${cls.id}/occurrences/${first!.reservationId}`)).status).toBe(204);
    expect((await admin.delete(`/api/classes/${cls.id}/occurrences/${first!.reservationId}`)).body.code).toBe('not_cancellable');
    expect((await admin.delete(`/api/classes/${cls.id}/occurrences/${randomUUID()}`)).status).toBe(404);

    const after = classSchema.parse((await instructor.get(`/api/classes/${cls.id}`)).body);
    expect(after.occurrences.map((o) => [o.reservationId, o.status])).toEqual([
      [first!.reservationId, 'cancelled'],
      [second!.reservationId, 'active'],
    ]);
    expect(after.cancelledAt).toBeNull();
  });
});
