import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dayRailBounds, reservationCheckedInSchema, stationScanResultSchema, stationStateSchema } from '@chuckkey/core';
import type { TestContext } from '../../test/harness';
import { liveStationContext, minutesFromNow, pairedDevice, welderReservedByInes } from './station.fixtures';

let ctx: TestContext;
let changed: string[];
beforeAll(async () => {
  ({ ctx, changed } = await liveStationContext('reservation_check_in'));
});
afterAll(() => ctx.close());

const MINUTE = 60_000;

/**
 * A paired welder station needing one training, Ines holding a reservation on it that starts
 * `startsIn` minutes from now, and Jonas, who is cleared on the welder too and has none.
 */
async function arrange(startsIn = 5, options: { checkInMinutes?: number; status?: 'active' | 'cancelled' } = {}) {
  const startsAt = minutesFromNow(startsIn);
  const scene = await welderReservedByInes(
    ctx,
    { startsAt, endsAt: new Date(startsAt.getTime() + 60 * MINUTE), status: options.status ?? 'active' },
    { check_in_minutes: options.checkInMinutes ?? 10, no_show_grace_minutes: 15 },
  );
  // Creating the station announced its machine; the tests look at what happens from here on.
  changed.length = 0;
  return scene;
}

type Device = Awaited<ReturnType<typeof arrange>>['device'];

async function scan(device: Device, badge: string) {
  const res = await device.post('/api/station/scan', { badge });
  expect(res.status).toBe(200);
  return stationScanResultSchema.parse(res.body);
}

const checkIn = (device: Device, reservationId: string, badge: string) =>
  device.post(`/api/station/reservations/${reservationId}/check-in`, { badge });

describe('rule 6 at the scan', () => {
  it('tells the holder they may check in and clears them: the reservation is their own', async () => {
    const { device, holder, reservationId, startsAt } = await arrange(5);
    const answer = await scan(device, holder.badge);
    expect(answer.cleared).toBe(true);
    expect(answer.nextReservation).toEqual({
      id: reservationId,
      startsAt: startsAt.toISOString(),
      endsAt: new Date(startsAt.getTime() + 60 * MINUTE).toISOString(),
      own: true,
      memberFirstName: 'Ines',
      canCheckIn: true,
    });
  });

  it('refuses another member with reservation_soon while the reservation protects the machine, in one statement', async () => {
    const { device, other } = await arrange(5);
    const statements: string[] = [];
    const listen = (query: { sql: string }) => statements.push(query.sql);
    ctx.db.on('query', listen);
    let answer;
    try {
      answer = await scan(device, other.badge);
    } finally {
      ctx.db.off('query', listen);
    }
    // product.md, rule 6: no one else's reservation starts within the protection window.
    expect(answer.cleared).toBe(false);
    expect(answer.reasons.map((r) => r.code)).toEqual(['reservation_soon']);
    expect(answer.rungs.find((rung) => rung.rule === 6)?.passed).toBe(false);
    expect(answer.nextReservation).toMatchObject({ own: false, memberFirstName: 'Ines', canCheckIn: false });
    expect(statements).toHaveLength(1);
  });

  it('lets a walk-up start when the reservation starts after the machine’s check-in window', async () => {
    const { device, other } = await arrange(30);
    const answer = await scan(device, other.badge);
    expect(answer.cleared).toBe(true);
    expect(answer.nextReservation).toBeNull();
  });

  // product.md: a reservation not checked into by its start plus the grace (15 min) is released.
  it('a reservation that has begun keeps others off through its grace, and to its end once checked in', async () => {
    const late = await arrange(-10);
    expect((await scan(late.device, late.other.badge)).reasons.map((r) => r.code)).toEqual(['reservation_soon']);

    const past = await arrange(-20);
    expect((await scan(past.device, past.other.badge)).cleared).toBe(true);

    const held = await arrange(-40);
    await ctx.db('reservations').where({ id: held.reservationId }).update({ status: 'checked_in', checked_in_at: minutesFromNow(-45) });
    expect((await scan(held.device, held.other.badge)).reasons.map((r) => r.code)).toEqual(['reservation_soon']);
    expect((await scan(held.device, held.holder.badge)).cleared).toBe(true);
  });

  it('a cancelled reservation protects nothing', async () => {
    const { device, other } = await arrange(5, { status: 'cancelled' });
    const answer = await scan(device, other.badge);
    expect(answer.cleared).toBe(true);
    expect(answer.nextReservation).toBeNull();
  });

  it('the station state names the next reservation, also one beyond the scan’s window', async () => {
    const { device, holder, startsAt } = await arrange(90);
    const res = await device.get('/api/station/state');
    expect(res.status).toBe(200);
    expect(stationStateSchema.parse(res.body).nextReservation).toEqual({
      startsAt: startsAt.toISOString(),
      endsAt: new Date(startsAt.getTime() + 60 * MINUTE).toISOString(),
      memberId: holder.member.id,
      memberFirstName: 'Ines',
    });
  });
});

describe('the station state’s day rail', () => {
  it('lists the machine’s live reservations touching today’s 06:00–24:00 in the shop’s zone, first names only', async () => {
    const { device, machine, holder, reservationId } = await arrange(90);
    const { timeZone } = await ctx.db('shop').first('time_zone as timeZone');
    // screens.md "Time bars": the rail runs 06:00–24:00 on the shop's wall clock.
    const rail = dayRailBounds(new Date(), timeZone);
    const at = (minutes: number) => new Date(rail.start.getTime() + minutes * MINUTE);
    await ctx.db('reservations').where({ id: reservationId }).delete();
    const insert = (startsAt: Date, endsAt: Date, fields: Record<string, unknown> = {}) =>
      ctx.db('reservations').insert({ machine_id: machine.id, member_id: holder.member.id, starts_at: startsAt, ends_at: endsAt, blocked_until: endsAt, ...fields });
    await insert(at(-90), at(30));
    await insert(at(480), at(600), { status: 'checked_in', checked_in_at: at(470) });
    await insert(at(120), at(180), { status: 'cancelled', cancelled_at: new Date() });
    await insert(new Date(rail.end.getTime() + 60 * MINUTE), new Date(rail.end.getTime() + 120 * MINUTE));

    const state = stationStateSchema.parse((await device.get('/api/station/state')).body);
    expect(state.today).toEqual([
      { startsAt: at(-90).toISOString(), endsAt: at(30).toISOString(), kind: 'member', memberFirstName: 'Ines' },
      { startsAt: at(480).toISOString(), endsAt: at(600).toISOString(), kind: 'member', memberFirstName: 'Ines' },
    ]);
  });
});

describe('POST /api/station/reservations/:id/check-in', () => {
  it('checks the holder in, announces the machine, and keeps others off it while the holder is cleared', async () => {
    const { device, machine, holder, other, reservationId } = await arrange(5);
    const res = await checkIn(device, reservationId, holder.badge);
    expect(res.status).toBe(200);
    expect(reservationCheckedInSchema.parse(res.body)).toEqual({ id: reservationId, status: 'checked_in' });
    const row = await ctx.db('reservations').first('status', 'checked_in_at').where({ id: reservationId });
    expect(row.status).toBe('checked_in');
    expect(row.checked_in_at).toBeInstanceOf(Date);
    expect(changed).toEqual([machine.id]);

    const refused = await scan(device, other.badge);
    expect(refused.reasons.map((r) => r.code)).toEqual(['reservation_soon']);
    const holderScan = await scan(device, holder.badge);
    expect(holderScan.cleared).toBe(true);
    expect(holderScan.nextReservation).toMatchObject({ own: true, canCheckIn: false });
  });

  it('a second check-in answers the same and announces nothing again', async () => {
    const { device, holder, reservationId } = await arrange(5);
    expect((await checkIn(device, reservationId, holder.badge)).status).toBe(200);
    changed.length = 0;
    const again = await checkIn(device, reservationId, holder.badge);
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ id: reservationId, status: 'checked_in' });
    expect(changed).toEqual([]);
  });

  it('refuses any badge but the holder’s with 403 not_yours', async () => {
    const { device, other, reservationId } = await arrange(5);
    const res = await checkIn(device, reservationId, other.badge);
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('not_yours');
    const unknown = await checkIn(device, reservationId, 'q'.repeat(22));
    expect(unknown.status).toBe(403);
    expect(unknown.body.code).toBe('not_yours');
    expect((await ctx.db('reservations').first('status').where({ id: reservationId })).status).toBe('active');
  });

  it('answers 409 not_in_window before the check-in window opens and after the grace', async () => {
    const early = await arrange(30);
    const tooEarly = await checkIn(early.device, early.reservationId, early.holder.badge);
    expect(tooEarly.status).toBe(409);
    expect(tooEarly.body.code).toBe('not_in_window');
    expect(changed).toEqual([]);

    const late = await arrange(-20);
    const tooLate = await checkIn(late.device, late.reservationId, late.holder.badge);
    expect(tooLate.status).toBe(409);
    expect(tooLate.body.code).toBe('not_in_window');
    expect(changed).toEqual([]);
  });

  it('within the grace after the start the holder may still check in', async () => {
    const { device, holder, reservationId } = await arrange(-10);
    expect((await checkIn(device, reservationId, holder.badge)).status).toBe(200);
  });

  it('follows the machine’s own check-in window', async () => {
    const { device, holder, reservationId } = await arrange(30, { checkInMinutes: 45 });
    expect((await scan(device, holder.badge)).nextReservation).toMatchObject({ own: true, canCheckIn: true });
    expect((await checkIn(device, reservationId, holder.badge)).status).toBe(200);
  });

  it('answers 404 at another machine’s station, for a cancelled reservation and for an unknown id', async () => {
    const { holder, reservationId } = await arrange(5);
    const elsewhere = await pairedDevice(ctx);
    const wrongStation = await checkIn(elsewhere.device, reservationId, holder.badge);
    expect(wrongStation.status).toBe(404);
    expect(wrongStation.body.code).toBe('reservation_not_found');

    const cancelled = await arrange(5, { status: 'cancelled' });
    expect((await checkIn(cancelled.device, cancelled.reservationId, cancelled.holder.badge)).status).toBe(404);
    expect((await checkIn(cancelled.device, randomUUID(), cancelled.holder.badge)).status).toBe(404);
    expect((await ctx.db('reservations').first('status').where({ id: reservationId })).status).toBe('active');
  });
});
