import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { boardSchema, HEARTBEAT_SILENCE_MINUTES, STATION_COOKIE, type Board, type BoardMachine } from '@chuckkey/core';
import { createArea, createBadge, createMachine, createMember } from '@chuckkey/db/factories';
import { browser, createTestContext, ownDatabase, signedIn, type TestContext } from '../../test/harness';
import { pairedBoard, pairedDevice } from '../station/station.fixtures';

let ctx: TestContext;
beforeAll(async () => {
  // Who is on duty and the opening hours are shop-wide; tests beside these change them.
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('board') });
  await ctx.db('shop').where({ id: 1 }).update({ name: 'Riverside Metal Shop', town: 'Riverside', time_zone: 'UTC' });
});
afterAll(() => ctx.close());

beforeEach(async () => {
  await ctx.db('duty_shifts').whereNull('ended_at').update({ ended_at: ctx.db.fn.now() });
  await ctx.db('shop_hours').delete();
  await ctx.db('shop_closures').delete();
});

function tile(board: Board, machineId: string): BoardMachine {
  const found = board.areas.flatMap((area) => area.machines).find((machine) => machine.id === machineId);
  if (!found) throw new Error(`machine ${machineId} is not on the board`);
  return found;
}

async function boardAsMember(): Promise<Board> {
  const res = await (await signedIn(ctx, 'member')).get('/api/board');
  expect(res.status).toBe(200);
  return boardSchema.parse(res.body);
}

describe('GET /api/board: who may see it', () => {
  it('a paired board device sees the board by its cookie alone', async () => {
    const { device } = await pairedBoard(ctx);
    const res = await device.get('/api/board');
    expect(res.status).toBe(200);
    expect(boardSchema.parse(res.body).shop).toEqual({ name: 'Riverside Metal Shop', timeZone: 'UTC' });
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('a machine station and anyone signed in see it too', async () => {
    const { device } = await pairedDevice(ctx);
    expect((await device.get('/api/board')).status).toBe(200);
    for (const role of ['member', 'instructor', 'admin'] as const) {
      expect((await (await signedIn(ctx, role)).get('/api/board')).status, role).toBe(200);
    }
  });

  it('without a device or a sign-in it answers 401 unauthorized', async () => {
    const res = await (await browser(ctx)).get('/api/board');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthorized');
  });

  it('a revoked board is refused and its cookie cleared', async () => {
    const { admin, device, station } = await pairedBoard(ctx);
    await admin.post(`/api/stations/${station.id}/revoke`);

    const res = await device.get('/api/board');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthorized');
    const cookies = (res.headers['set-cookie'] as unknown as string[]).filter((cookie) => cookie.startsWith(`${STATION_COOKIE}=`));
    expect(cookies[0]).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('reads the device and then the whole board, one statement each', async () => {
    const area = await createArea(ctx.db, { name: 'Counted area' });
    for (let i = 0; i < 5; i += 1) await createMachine(ctx.db, { area_id: area.id });
    const { device } = await pairedBoard(ctx);
    const statements: string[] = [];
    const listen = (query: { sql: string }) => statements.push(query.sql);
    ctx.db.on('query', listen);
    try {
      expect((await device.get('/api/board')).status).toBe(200);
    } finally {
      ctx.db.off('query', listen);
    }
    // Pairing recorded the device's contact just now, so this request does not write it again.
    expect(statements).toHaveLength(2);
    expect(statements[1]).toMatch(/from machines m/);
  });
});

describe('GET /api/board: what it shows', () => {
  it('groups machines by area in the shop’s order, each area’s machines by name, and leaves out empty areas', async () => {
    const later = await createArea(ctx.db, { name: 'Welding bay', sort_order: 90 });
    const earlier = await createArea(ctx.db, { name: 'Lathe row', sort_order: 80 });
    const empty = await createArea(ctx.db, { name: 'Empty corner', sort_order: 85 });
    await createMachine(ctx.db, { area_id: later.id, name: 'Welder bench 2', category: 'mig_welder' });
    await createMachine(ctx.db, { area_id: earlier.id, name: 'Lathe Z', category: 'lathe' });
    await createMachine(ctx.db, { area_id: earlier.id, name: 'Lathe A', category: 'lathe' });

    const board = await boardAsMember();

    const ids = board.areas.map((area) => area.id);
    expect(ids).not.toContain(empty.id);
    expect(ids.indexOf(earlier.id)).toBeLessThan(ids.indexOf(later.id));
    const lathes = board.areas.find((area) => area.id === earlier.id)!;
    expect(lathes.name).toBe('Lathe row');
    expect(lathes.machines.map((machine) => machine.name)).toEqual(['Lathe A', 'Lathe Z']);
    expect(lathes.machines[0]).toMatchObject({ category: 'lathe', state: 'available', member: null, startedAt: null, nextReservationAt: null, tagOut: null });
    expect(board.classes).toEqual([]);
  });

  it('shows the next reservation’s start, and the machine reserved from its check-in window until it is checked into, never whose it is', async () => {
    const machine = await createMachine(ctx.db, { reservable: true });
    await ctx.db('machines').where({ id: machine.id }).update({ check_in_minutes: 10 });
    const member = await createMember(ctx.db, { first_name: 'Talia', last_name: 'Greaves' });
    const minutes = (n: number) => new Date(Date.now() + n * 60_000);
    const reserve = async (startIn: number, endIn: number, status = 'active') =>
      (await ctx.db('reservations')
        .insert({ machine_id: machine.id, member_id: member.id, starts_at: minutes(startIn), ends_at: minutes(endIn), blocked_until: minutes(endIn), status })
        .returning(['id', 'starts_at']))[0] as { id: string; starts_at: Date };

    const later = await reserve(60, 120);
    let shown = tile(await boardAsMember(), machine.id);
    expect(shown).toMatchObject({ state: 'available', nextReservationAt: later.starts_at.toISOString() });

    const soon = await reserve(5, 30);
    shown = tile(await boardAsMember(), machine.id);
    expect(shown).toMatchObject({ state: 'reserved', member: null, nextReservationAt: soon.starts_at.toISOString() });
    expect(JSON.stringify(shown)).not.toContain('Talia');

    await ctx.db('reservations').where({ id: soon.id }).update({ status: 'no_show' });
    expect(tile(await boardAsMember(), machine.id)).toMatchObject({ state: 'available', nextReservationAt: later.starts_at.toISOString() });
  });

  it('shows a running session as in use, with the member’s first name and last initial and the start', async () => {
    const machine = await createMachine(ctx.db);
    const member = await createMember(ctx.db, { first_name: 'Ines', last_name: 'Marrow' });
    const [session] = await ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id }).returning(['started_at']);

    const shown = tile(await boardAsMember(), machine.id);

    expect(shown).toMatchObject({ state: 'in_use', member: { firstName: 'Ines', lastInitial: 'M' } });
    expect(shown.startedAt).toBe((session.started_at as Date).toISOString());
  });

  it('shows an open tag-out with its reason and since when, above a running session', async () => {
    const machine = await createMachine(ctx.db);
    const member = await createMember(ctx.db);
    await ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id });
    const [tag] = await ctx.db('tag_outs').insert({ machine_id: machine.id, reason: 'Tailstock quill sticks.', reported_by: member.id }).returning(['reported_at']);

    const shown = tile(await boardAsMember(), machine.id);

    expect(shown.state).toBe('tagged_out');
    expect(shown.tagOut).toEqual({ reason: 'Tailstock quill sticks.', since: (tag.reported_at as Date).toISOString() });
  });

  it('a cleared tag-out no longer shows', async () => {
    const machine = await createMachine(ctx.db);
    const member = await createMember(ctx.db);
    await ctx.db('tag_outs').insert({ machine_id: machine.id, reason: 'Belt slipping.', reported_by: member.id, cleared_at: ctx.db.fn.now(), cleared_by: member.id, clear_note: 'New belt.' });

    expect(tile(await boardAsMember(), machine.id)).toMatchObject({ state: 'available', tagOut: null });
  });

  it('shows a machine offline when its station has been silent longer than the heartbeat limit, and back when it is heard', async () => {
    const { machine, station, device } = await pairedDevice(ctx);
    await ctx.db('stations').where({ id: station.id }).update({ last_seen_at: new Date(Date.now() - (HEARTBEAT_SILENCE_MINUTES + 1) * 60_000) });
    expect(tile(await boardAsMember(), machine.id).state).toBe('offline');

    expect((await device.post('/api/station/heartbeat')).status).toBe(204);

    expect(tile(await boardAsMember(), machine.id).state).toBe('available');
  });

  it('a revoked station does not make its machine offline', async () => {
    const { admin, machine, station } = await pairedDevice(ctx);
    await ctx.db('stations').where({ id: station.id }).update({ last_seen_at: new Date(Date.now() - 60 * 60_000) });
    await admin.post(`/api/stations/${station.id}/revoke`);

    expect(tile(await boardAsMember(), machine.id).state).toBe('available');
  });

  it('names the longest-serving supervisor on duty by first name and last initial', async () => {
    const first = await createMember(ctx.db, { role: 'instructor', first_name: 'Bettina', last_name: 'Okafor' });
    const second = await createMember(ctx.db, { role: 'admin', first_name: 'Tomas', last_name: 'Lindqvist' });
    await ctx.db('duty_shifts').insert({ member_id: first.id, started_at: new Date(Date.now() - 60 * 60_000) });
    await ctx.db('duty_shifts').insert({ member_id: second.id });

    expect((await boardAsMember()).supervisorOnDuty).toEqual({ firstName: 'Bettina', lastInitial: 'O' });
  });

  it('shows no supervisor when nobody is on duty', async () => {
    expect((await boardAsMember()).supervisorOnDuty).toBeNull();
  });

  it('gives today’s hours on the shop’s wall clock, and a closure with its reason', async () => {
    const board = await boardAsMember();
    // No weekly hours set: open at all times (docs/api.md, shop hours).
    expect(board.today).toMatchObject({ open: true, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closure: null });
    expect(board.today.date).toBe(board.generatedAt.slice(0, 10));

    await ctx.db('shop_closures').insert({ starts_on: board.today.date, ends_on: board.today.date, reason: 'Winter deep clean' });
    const closed = await boardAsMember();
    expect(closed.today).toMatchObject({ open: false, intervals: [], closure: { reason: 'Winter deep clean' } });
  });

  it('today’s openings come from the weekly hours of today’s weekday', async () => {
    const today = new Date();
    const weekday = ((today.getUTCDay() + 6) % 7) + 1;
    await ctx.db('shop_hours').insert([
      { weekday, opens_at: '16:00', closes_at: '22:00' },
      { weekday, opens_at: '09:00', closes_at: '12:00' },
      { weekday: (weekday % 7) + 1, opens_at: '08:00', closes_at: '09:00' },
    ]);

    expect((await boardAsMember()).today.intervals).toEqual([
      { opensAt: '09:00', closesAt: '12:00' },
      { opensAt: '16:00', closesAt: '22:00' },
    ]);
  });
});

describe('GET /api/board: privacy', () => {
  it('carries no e-mail, last name, badge code or member id of the member on a machine or the supervisor', async () => {
    const machine = await createMachine(ctx.db);
    const member = await createMember(ctx.db, { first_name: 'Wren', last_name: 'Quillfeather' });
    const { code } = await createBadge(ctx.db, { memberId: member.id, badgeSecret: ctx.config.BADGE_SECRET });
    await ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id });
    const supervisor = await createMember(ctx.db, { role: 'instructor', first_name: 'Odile', last_name: 'Brackenridge' });
    await ctx.db('duty_shifts').insert({ member_id: supervisor.id });

    const { device } = await pairedBoard(ctx);
    const res = await device.get('/api/board');
    const text = JSON.stringify(res.body);

    expect(tile(boardSchema.parse(res.body), machine.id).member).toEqual({ firstName: 'Wren', lastInitial: 'Q' });
    for (const secret of [member.email, member.last_name, code, member.id, supervisor.email, supervisor.last_name, supervisor.id]) {
      expect(text).not.toContain(secret);
    }
  });
});
