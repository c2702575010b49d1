import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reservationSchema, stationScanResultSchema, stationStateSchema } from '@chuckkey/core';
import { browser, type TestContext } from '../../test/harness';
import { badgeHolder, liveStationContext, minutesFromNow, welderReservedByInes, type BadgeHolder } from '../station/station.fixtures';

let ctx: TestContext;
let changed: string[];
beforeAll(async () => {
  ({ ctx, changed } = await liveStationContext('reservation_release'));
});
afterAll(() => ctx.close());

const MINUTE = 60_000;
/** The next quarter hour at least `minutes` from now: reservations start on the machine's 15-minute steps. */
function quarterAfter(minutes: number): Date {
  const at = minutesFromNow(minutes).getTime();
  return new Date(Math.ceil(at / (15 * MINUTE)) * 15 * MINUTE);
}

/** A badge holder signed in to the web app with their own e-mail and password. */
async function signedInAs(holder: BadgeHolder) {
  const client = await browser(ctx);
  const res = await client.post('/api/auth/login', { email: holder.member.email, password: holder.member.password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return client;
}

/**
 * A paired, reservable welder station needing one training; Ines holds a reservation on it that
 * began 5 minutes ago and runs two hours (checked in unless `status` says otherwise); Jonas is
 * cleared on the welder too and holds none.
 */
async function arrange(options: { status?: 'active' | 'checked_in'; startedMinutesAgo?: number; lengthMinutes?: number } = {}) {
  const startsAt = minutesFromNow(-(options.startedMinutesAgo ?? 5));
  const endsAt = new Date(startsAt.getTime() + (options.lengthMinutes ?? 120) * MINUTE);
  const scene = await welderReservedByInes(
    ctx,
    { startsAt, endsAt, status: options.status ?? 'checked_in' },
    { reservable: true, check_in_minutes: 10, no_show_grace_minutes: 15, buffer_minutes: 0 },
  );
  changed.length = 0;
  return scene;
}

type Device = Awaited<ReturnType<typeof arrange>>['device'];

async function scan(device: Device, badge: string) {
  const res = await device.post('/api/station/scan', { badge });
  expect(res.status).toBe(200);
  return stationScanResultSchema.parse(res.body);
}

async function startSession(device: Device, holder: BadgeHolder): Promise<string> {
  const res = await device.post('/api/station/sessions', { badge: holder.badge, checklist: [] });
  expect(res.status).toBe(201);
  return (res.body as { id: string }).id;
}

const statusOf = async (id: string) => (await ctx.db('reservations').first('status', 'released_at').where({ id })) as { status: string; released_at: Date | null };

describe('ending the session gives the rest of a checked-in reservation back', () => {
  it('the holder’s own end releases it, with the time, an audit entry and the machine announced', async () => {
    const { device, machine, holder, other, reservationId } = await arrange();
    expect((await scan(device, other.badge)).reasons.map((r) => r.code)).toEqual(['reservation_soon']);
    const sessionId = await startSession(device, holder);
    changed.length = 0;

    const before = Date.now();
    const res = await device.post(`/api/station/sessions/${sessionId}/end`, { idempotencyKey: randomUUID() });
    expect(res.status).toBe(200);

    const row = await statusOf(reservationId);
    expect(row.status).toBe('released');
    expect(row.released_at!.getTime()).toBeGreaterThanOrEqual(before - 1000);
    expect(row.released_at!.getTime()).toBeLessThanOrEqual(Date.now());
    expect(changed).toEqual([machine.id]);
    const audit = await ctx.db('audit_log').select('actor_id', 'member_id', 'details').where({ action: 'reservation.released', entity_id: reservationId });
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ actor_id: holder.member.id, member_id: holder.member.id, details: { machineId: machine.id, via: 'session_end' } });

    // product.md, rule 6: another's reservation protects the machine "unless … it was released".
    const walkUp = await scan(device, other.badge);
    expect(walkUp.cleared).toBe(true);
    expect(walkUp.nextReservation).toBeNull();
    expect(stationStateSchema.parse((await device.get('/api/station/state')).body).nextReservation).toBeNull();
  });

  it('a supervisor ending the holder’s session leaves the reservation checked in', async () => {
    const { device, holder, reservationId } = await arrange();
    const supervisor = await badgeHolder(ctx, 'instructor', { firstName: 'Bettina' });
    const sessionId = await startSession(device, holder);
    const res = await device.post(`/api/station/sessions/${sessionId}/end`, { idempotencyKey: randomUUID(), badge: supervisor.badge });
    expect(res.status).toBe(200);
    expect((await statusOf(reservationId)).status).toBe('checked_in');
  });

  it('a reservation not checked into stays as it was', async () => {
    const { device, holder, reservationId } = await arrange({ status: 'active' });
    const sessionId = await startSession(device, holder);
    expect((await device.post(`/api/station/sessions/${sessionId}/end`, { idempotencyKey: randomUUID() })).status).toBe(200);
    expect((await statusOf(reservationId)).status).toBe('active');
  });
});

describe('POST /api/reservations/:id/release', () => {
  it('releases the holder’s running checked-in reservation: 200 released, audit entry, machine announced', async () => {
    const { machine, holder, reservationId } = await arrange();
    const web = await signedInAs(holder);
    const res = await web.post(`/api/reservations/${reservationId}/release`);
    expect(res.status).toBe(200);
    expect(reservationSchema.parse(res.body)).toMatchObject({ id: reservationId, status: 'released' });
    expect((await statusOf(reservationId)).released_at).toBeInstanceOf(Date);
    expect(changed).toEqual([machine.id]);
    const audit = await ctx.db('audit_log').first('details').where({ action: 'reservation.released', entity_id: reservationId });
    expect(audit?.details).toMatchObject({ via: 'web' });
  });

  it('answers 403 not_yours to anyone but the holder, an admin too, and changes nothing', async () => {
    const { other, reservationId } = await arrange();
    const admin = await badgeHolder(ctx, 'admin', { firstName: 'Dora' });
    for (const someone of [other, admin]) {
      const res = await (await signedInAs(someone)).post(`/api/reservations/${reservationId}/release`);
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('not_yours');
    }
    expect((await statusOf(reservationId)).status).toBe('checked_in');
    expect(changed).toEqual([]);
  });

  it('answers 409 not_releasable when not checked in, already over, or already released', async () => {
    const notCheckedIn = await arrange({ status: 'active' });
    const first = await (await signedInAs(notCheckedIn.holder)).post(`/api/reservations/${notCheckedIn.reservationId}/release`);
    expect(first.status).toBe(409);
    expect(first.body.code).toBe('not_releasable');

    const over = await arrange({ startedMinutesAgo: 90, lengthMinutes: 60 });
    const second = await (await signedInAs(over.holder)).post(`/api/reservations/${over.reservationId}/release`);
    expect(second.status).toBe(409);
    expect(second.body.code).toBe('not_releasable');
    expect((await statusOf(over.reservationId)).status).toBe('checked_in');

    const twice = await arrange();
    const web = await signedInAs(twice.holder);
    expect((await web.post(`/api/reservations/${twice.reservationId}/release`)).status).toBe(200);
    const again = await web.post(`/api/reservations/${twice.reservationId}/release`);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('not_releasable');
  });

  it('answers 404 for an unknown id and 401 without a sign-in', async () => {
    const { holder } = await arrange();
    expect((await (await signedInAs(holder)).post(`/api/reservations/${randomUUID()}/release`)).status).toBe(404);
    expect((await (await browser(ctx)).post(`/api/reservations/${randomUUID()}/release`)).status).toBe(401);
  });

  it('after the release another member is not refused by rule 6 and may reserve the freed time', async () => {
    const { device, machine, holder, other, reservationId, endsAt } = await arrange();
    const otherWeb = await signedInAs(other);
    const freed = { machineId: machine.id, start: quarterAfter(15).toISOString(), end: quarterAfter(45).toISOString() };
    expect(new Date(freed.end).getTime()).toBeLessThanOrEqual(endsAt.getTime());
    // Before the release the database's exclusion constraint keeps the slot (decision 011).
    const refused = await otherWeb.post('/api/reservations', freed);
    expect(refused.status).toBe(409);
    expect(refused.body.code).toBe('overlap');

    expect((await (await signedInAs(holder)).post(`/api/reservations/${reservationId}/release`)).status).toBe(200);

    // product.md, rule 6: a released reservation protects nothing.
    const walkUp = await scan(device, other.badge);
    expect(walkUp.cleared).toBe(true);
    const accepted = await otherWeb.post('/api/reservations', freed);
    expect(accepted.status).toBe(201);
    expect(reservationSchema.parse(accepted.body)).toMatchObject({ status: 'active', start: freed.start, end: freed.end });
  });
});
