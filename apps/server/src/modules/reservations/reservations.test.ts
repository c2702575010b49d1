import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { availabilitySchema, machineReservationRulesSchema, myReservationsSchema, reservationSchema } from '@chuckkey/core';
import { createMachine, createSignOff, createTraining } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/** An instant `days` after today's midnight in the test shop's time zone (UTC), at hh:mm. */
function slot(days: number, hours: number, minutes = 0): Date {
  const midnight = new Date();
  midnight.setUTCHours(0, 0, 0, 0);
  return new Date(midnight.getTime() + days * DAY + hours * HOUR + minutes * 60_000);
}

const body = (machineId: string, start: Date, end: Date) => ({ machineId, start: start.toISOString(), end: end.toISOString() });

async function reservableMachine(rules: Record<string, number> = {}) {
  const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
  if (Object.keys(rules).length > 0) await ctx.db('machines').where({ id: machine.id }).update(rules);
  return machine;
}

describe('POST /api/reservations', () => {
  it('reserves a free slot: 201 with the reservation, one row with its buffer, and an audit entry', async () => {
    const machine = await reservableMachine({ buffer_minutes: 15 });
    const member = await signedIn(ctx, 'member');
    const start = slot(2, 9);
    const end = slot(2, 11);

    const res = await member.post('/api/reservations', body(machine.id, start, end));

    expect(res.status).toBe(201);
    const reservation = reservationSchema.parse(res.body);
    expect(reservation).toEqual({ id: reservation.id, machineId: machine.id, start: start.toISOString(), end: end.toISOString(), status: 'active' });
    const row = await ctx.db('reservations').first('*').where({ id: reservation.id });
    expect(row).toMatchObject({ member_id: member.member.id, kind: 'member', status: 'active' });
    expect(row.blocked_until).toEqual(slot(2, 11, 15));
    const audit = await ctx.db('audit_log').select('actor_id', 'member_id', 'details').where({ action: 'reservation.created', entity_id: reservation.id });
    expect(audit).toEqual([
      { actor_id: member.member.id, member_id: member.member.id, details: { machineId: machine.id, machineName: machine.name, start: start.toISOString(), end: end.toISOString() } },
    ]);
  });

  it('answers 409 overlap for a slot that meets another claim or its cleanup buffer, and takes the slot after the buffer', async () => {
    const machine = await reservableMachine({ buffer_minutes: 15 });
    const first = await signedIn(ctx, 'member');
    const second = await signedIn(ctx, 'member');
    expect((await first.post('/api/reservations', body(machine.id, slot(3, 10), slot(3, 11)))).status).toBe(201);

    const inBuffer = await second.post('/api/reservations', body(machine.id, slot(3, 11), slot(3, 12)));
    expect(inBuffer.status).toBe(409);
    // RFC 9457 §3: problem details, with the rule that refused it as `code`.
    expect(inBuffer.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(inBuffer.body).toMatchObject({ status: 409, code: 'overlap' });

    expect((await second.post('/api/reservations', body(machine.id, slot(3, 11, 15), slot(3, 12)))).status).toBe(201);
  });

  it('of 50 requests at once for overlapping slots on one machine, exactly one lands and 49 answer 409 overlap', async () => {
    const machine = await reservableMachine();
    const members = await Promise.all(Array.from({ length: 50 }, () => signedIn(ctx, 'member')));

    // Every request holds 11:00–12:00, so each pair overlaps whichever quarter hour it starts on.
    const answers = await Promise.all(
      members.map((member, i) => member.post('/api/reservations', body(machine.id, slot(4, 10, (i % 4) * 15), slot(4, 12)))),
    );

    expect(answers.filter((res) => res.status === 201)).toHaveLength(1);
    const refused = answers.filter((res) => res.status !== 201);
    expect(refused).toHaveLength(49);
    for (const res of refused) expect([res.status, res.body.code]).toEqual([409, 'overlap']);
    expect(await ctx.db('reservations').where({ machine_id: machine.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('refuses with the rule that failed as the code', async () => {
    const member = await signedIn(ctx, 'member');
    const machine = await reservableMachine({ max_minutes: 120 });

    const tooLong = await member.post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 11, 30)));
    expect([tooLong.status, tooLong.body.code]).toEqual([409, 'too_long']);

    const offStep = await member.post('/api/reservations', body(machine.id, slot(2, 9, 5), slot(2, 10, 5)));
    expect(offStep.body.code).toBe('bad_step');

    const beyond = await member.post('/api/reservations', body(machine.id, slot(16, 9), slot(16, 10)));
    expect(beyond.body.code).toBe('beyond_horizon');

    const past = await member.post('/api/reservations', body(machine.id, slot(-1, 9), slot(-1, 10)));
    expect(past.body.code).toBe('in_the_past');

    const walkUp = await createMachine(ctx.db, { reservable: false });
    const notReservable = await member.post('/api/reservations', body(walkUp.id, slot(2, 9), slot(2, 10)));
    expect(notReservable.body.code).toBe('not_reservable');

    expect(await ctx.db('reservations').where({ member_id: member.member.id }).count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('counts the weekly quota over the member’s own reservations and answers quota_exceeded', async () => {
    const machine = await reservableMachine({ weekly_quota_minutes: 60, horizon_days: 30 });
    const member = await signedIn(ctx, 'member');
    // Both on the same day, hence in the same Monday-to-Sunday week.
    expect((await member.post('/api/reservations', body(machine.id, slot(8, 9), slot(8, 9, 45)))).status).toBe(201);

    const over = await member.post('/api/reservations', body(machine.id, slot(8, 13), slot(8, 13, 30)));
    expect(over.status).toBe(409);
    expect(over.body.code).toBe('quota_exceeded');
    expect(over.body.detail).toContain('15 min left');
  });

  it('leaves a class the instructor holds on the machine out of their weekly quota', async () => {
    const machine = await reservableMachine({ weekly_quota_minutes: 60, horizon_days: 30 });
    const instructor = await signedIn(ctx, 'instructor');
    await ctx.db('reservations').insert({
      machine_id: machine.id,
      member_id: instructor.member.id,
      starts_at: slot(8, 9),
      ends_at: slot(8, 11),
      blocked_until: slot(8, 11),
      kind: 'class',
    });
    expect((await instructor.post('/api/reservations', body(machine.id, slot(8, 13), slot(8, 14)))).status).toBe(201);
  });

  it('answers training_required naming the training, also when the sign-off lapses before the start', async () => {
    const machine = await reservableMachine();
    const training = await createTraining(ctx.db, { name: `MIG welding safety ${randomUUID().slice(0, 6)}`, machine_ids: [machine.id] });
    const member = await signedIn(ctx, 'member');

    const none = await member.post('/api/reservations', body(machine.id, slot(5, 9), slot(5, 10)));
    expect([none.status, none.body.code]).toEqual([409, 'training_required']);
    expect(none.body.detail).toContain(training.name);

    await createSignOff(ctx.db, { member_id: member.member.id, training_id: training.id, expires_at: slot(3, 0) });
    const lapsing = await member.post('/api/reservations', body(machine.id, slot(5, 9), slot(5, 10)));
    expect(lapsing.body.code).toBe('training_required');
    expect(lapsing.body.detail).toContain('before this reservation starts');

    expect((await member.post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 10)))).status).toBe(201);
  });

  it('answers suspended after the no-show limit within the window', async () => {
    const machine = await reservableMachine();
    const member = await signedIn(ctx, 'member');
    await ctx.db('reservations').insert(
      [-9, -6, -3].map((days) => ({
        machine_id: machine.id,
        member_id: member.member.id,
        starts_at: slot(days, 9),
        ends_at: slot(days, 10),
        blocked_until: slot(days, 10),
        status: 'no_show',
      })),
    );
    const res = await member.post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 10)));
    expect([res.status, res.body.code]).toEqual([409, 'suspended']);
  });

  it('answers 400 with field errors for a malformed request, 404 for an unknown machine and 401 signed out', async () => {
    const member = await signedIn(ctx, 'member');
    const backwards = await member.post('/api/reservations', { machineId: randomUUID(), start: slot(2, 10).toISOString(), end: slot(2, 9).toISOString() });
    expect(backwards.status).toBe(400);
    expect(backwards.body.errors.end).toBeDefined();

    const unknown = await member.post('/api/reservations', body(randomUUID(), slot(2, 9), slot(2, 10)));
    expect([unknown.status, unknown.body.code]).toEqual([404, 'machine_not_found']);

    const machine = await reservableMachine();
    expect((await (await browser(ctx)).post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 10)))).status).toBe(401);
  });
});

describe('the reservations table', () => {
  it('refuses overlapping live claims by itself (SQLSTATE 23P01) and lets cancelled ones be overlapped', async () => {
    const machine = await reservableMachine();
    const member = await signedIn(ctx, 'member');
    const row = { machine_id: machine.id, member_id: member.member.id, starts_at: slot(6, 9), ends_at: slot(6, 10), blocked_until: slot(6, 10) };
    const [first] = await ctx.db('reservations').insert(row).returning('id');
    // PostgreSQL: SQLSTATE 23P01 is exclusion_violation.
    await expect(ctx.db('reservations').insert({ ...row, starts_at: slot(6, 9, 30) })).rejects.toMatchObject({ code: '23P01' });

    await ctx.db('reservations').where({ id: first.id }).update({ status: 'cancelled', cancelled_at: new Date() });
    await expect(ctx.db('reservations').insert({ ...row, starts_at: slot(6, 9, 30) })).resolves.toBeDefined();
  });
});

describe('DELETE /api/reservations/:id', () => {
  it('lets a member cancel their own reservation: 204, the slot is free again, and an audit entry', async () => {
    const machine = await reservableMachine();
    const member = await signedIn(ctx, 'member');
    const made = await member.post('/api/reservations', body(machine.id, slot(2, 14), slot(2, 15)));

    const res = await member.delete(`/api/reservations/${made.body.id}`);

    expect(res.status).toBe(204);
    expect(await ctx.db('reservations').first('status').where({ id: made.body.id })).toEqual({ status: 'cancelled' });
    expect(await ctx.db('audit_log').where({ action: 'reservation.cancelled', entity_id: made.body.id }).count({ n: '*' })).toEqual([{ n: 1 }]);
    expect((await (await signedIn(ctx, 'member')).post('/api/reservations', body(machine.id, slot(2, 14), slot(2, 15)))).status).toBe(201);

    const again = await member.delete(`/api/reservations/${made.body.id}`);
    expect([again.status, again.body.code]).toEqual([409, 'not_cancellable']);
  });

  it('answers 404 to another member and lets an admin cancel anyone’s', async () => {
    const machine = await reservableMachine();
    const owner = await signedIn(ctx, 'member');
    const made = await owner.post('/api/reservations', body(machine.id, slot(2, 16), slot(2, 17)));

    const other = await (await signedIn(ctx, 'instructor')).delete(`/api/reservations/${made.body.id}`);
    expect([other.status, other.body.code]).toEqual([404, 'reservation_not_found']);

    const admin = await signedIn(ctx, 'admin');
    expect((await admin.delete(`/api/reservations/${made.body.id}`)).status).toBe(204);
    const audit = await ctx.db('audit_log').first('actor_id', 'member_id').where({ action: 'reservation.cancelled', entity_id: made.body.id });
    expect(audit).toEqual({ actor_id: admin.member.id, member_id: owner.member.id });
  });
});

describe('GET /api/reservations/mine', () => {
  it('lists upcoming reservations soonest first and past ones latest first, with the machine named', async () => {
    const machine = await reservableMachine();
    const member = await signedIn(ctx, 'member');
    const later = await member.post('/api/reservations', body(machine.id, slot(3, 15), slot(3, 16)));
    const sooner = await member.post('/api/reservations', body(machine.id, slot(2, 15), slot(2, 16)));
    const cancelled = await member.post('/api/reservations', body(machine.id, slot(4, 15), slot(4, 16)));
    await member.delete(`/api/reservations/${cancelled.body.id}`);
    await ctx.db('reservations').insert({
      machine_id: machine.id,
      member_id: member.member.id,
      starts_at: slot(-2, 9),
      ends_at: slot(-2, 10),
      blocked_until: slot(-2, 10),
      status: 'no_show',
    });

    const res = await member.get('/api/reservations/mine');

    expect(res.status).toBe(200);
    const mine = myReservationsSchema.parse(res.body);
    expect(mine.upcoming.map((r) => r.id)).toEqual([sooner.body.id, later.body.id]);
    expect(mine.upcoming[0]).toMatchObject({ machineName: machine.name, kind: 'member', status: 'active' });
    expect(mine.past.map((r) => r.status)).toEqual(['cancelled', 'no_show']);
  });
});

describe('GET /api/machines/:id/availability', () => {
  it('answers the taken ranges in the range, naming no one, and the machine’s rules', async () => {
    const machine = await reservableMachine({ buffer_minutes: 15 });
    const member = await signedIn(ctx, 'member', { first_name: 'Odalys', last_name: 'Brenner' });
    await member.post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 10)));
    await member.post('/api/reservations', body(machine.id, slot(9, 9), slot(9, 10)));

    const viewer = await signedIn(ctx, 'member');
    const res = await viewer.get(`/api/machines/${machine.id}/availability?from=${encodeURIComponent(slot(1, 0).toISOString())}&to=${encodeURIComponent(slot(8, 0).toISOString())}`);

    expect(res.status).toBe(200);
    const availability = availabilitySchema.parse(res.body);
    expect(availability).toMatchObject({ machineId: machine.id, reservable: true, timeZone: 'UTC' });
    expect(availability.rules).toEqual({
      slotMinutes: 15,
      maxMinutes: 120,
      bufferMinutes: 15,
      horizonDays: 14,
      weeklyQuotaMinutes: 360,
      checkInMinutes: 10,
      noShowGraceMinutes: 15,
      noShowLimit: 3,
      noShowWindowDays: 30,
      suspensionDays: 7,
    });
    expect(availability.taken).toEqual([
      { start: slot(2, 9).toISOString(), end: slot(2, 10).toISOString(), blockedUntil: slot(2, 10, 15).toISOString(), kind: 'member' },
    ]);
    const text = JSON.stringify(res.body);
    for (const secret of ['Odalys', 'Brenner', member.member.id, member.member.email]) expect(text).not.toContain(secret);
  });

  it('answers 400 for a range that is missing or backwards and 404 for an unknown machine', async () => {
    const viewer = await signedIn(ctx, 'member');
    const machine = await reservableMachine();
    expect((await viewer.get(`/api/machines/${machine.id}/availability`)).status).toBe(400);
    const backwards = await viewer.get(`/api/machines/${machine.id}/availability?from=${slot(3, 0).toISOString()}&to=${slot(2, 0).toISOString()}`);
    expect(backwards.status).toBe(400);
    expect(backwards.body.errors.to).toBeDefined();
    const unknown = await viewer.get(`/api/machines/${randomUUID()}/availability?from=${slot(1, 0).toISOString()}&to=${slot(2, 0).toISOString()}`);
    expect([unknown.status, unknown.body.code]).toEqual([404, 'machine_not_found']);
  });
});

describe('GET and PUT /api/machines/:id/reservation-rules', () => {
  const rules = {
    reservable: true,
    slotMinutes: 30,
    maxMinutes: 180,
    bufferMinutes: 15,
    horizonDays: 21,
    weeklyQuotaMinutes: 480,
    checkInMinutes: 10,
    noShowGraceMinutes: 15,
    noShowLimit: 2,
    noShowWindowDays: 30,
    suspensionDays: 14,
  };

  it('lets an admin set the rules, recorded before and after in the audit log, and keeps the buffer of claims already made', async () => {
    const machine = await reservableMachine();
    const member = await signedIn(ctx, 'member');
    const made = await member.post('/api/reservations', body(machine.id, slot(2, 9), slot(2, 10)));
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.put(`/api/machines/${machine.id}/reservation-rules`, rules);

    expect(res.status).toBe(200);
    const { reservable, ...expected } = rules;
    expect(machineReservationRulesSchema.parse(res.body)).toEqual({ machineId: machine.id, reservable, rules: expected });
    const audit = await ctx.db('audit_log').first('actor_id', 'details').where({ action: 'machine.reservation_rules_changed', entity_id: machine.id });
    expect(audit.actor_id).toBe(admin.member.id);
    expect(audit.details.before).toMatchObject({ reservable: true, slotMinutes: 15, bufferMinutes: 0 });
    expect(audit.details.after).toEqual(rules);
    expect(await ctx.db('reservations').first('blocked_until').where({ id: made.body.id })).toEqual({ blocked_until: slot(2, 10) });
    const offStep = await member.post('/api/reservations', body(machine.id, slot(3, 9, 15), slot(3, 10, 15)));
    expect(offStep.body.code).toBe('bad_step');
    // The admins' form reads back what was saved.
    const read = await admin.get(`/api/machines/${machine.id}/reservation-rules`);
    expect(read.status).toBe(200);
    expect(machineReservationRulesSchema.parse(read.body)).toEqual({ machineId: machine.id, reservable, rules: expected });
  });

  it('reads the rules only for admins, and answers 404 for an unknown machine', async () => {
    const machine = await reservableMachine();
    expect((await (await signedIn(ctx, 'member')).get(`/api/machines/${machine.id}/reservation-rules`)).status).toBe(403);
    expect((await (await signedIn(ctx, 'instructor')).get(`/api/machines/${machine.id}/reservation-rules`)).status).toBe(403);
    const unknown = await (await signedIn(ctx, 'admin')).get(`/api/machines/${randomUUID()}/reservation-rules`);
    expect([unknown.status, unknown.body.code]).toEqual([404, 'machine_not_found']);
  });

  it('answers 400 for a step that does not divide the day or a maximum off the step, and 403 to an instructor', async () => {
    const machine = await reservableMachine();
    const admin = await signedIn(ctx, 'admin');
    const badStep = await admin.put(`/api/machines/${machine.id}/reservation-rules`, { ...rules, slotMinutes: 25 });
    expect(badStep.status).toBe(400);
    expect(badStep.body.errors.slotMinutes).toBeDefined();
    const badMax = await admin.put(`/api/machines/${machine.id}/reservation-rules`, { ...rules, maxMinutes: 100 });
    expect(badMax.body.errors.maxMinutes).toBeDefined();
    expect((await (await signedIn(ctx, 'instructor')).put(`/api/machines/${machine.id}/reservation-rules`, rules)).status).toBe(403);
    const unknown = await admin.put(`/api/machines/${randomUUID()}/reservation-rules`, rules);
    expect([unknown.status, unknown.body.code]).toEqual([404, 'machine_not_found']);
  });
});
