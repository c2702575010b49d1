import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reservationListSchema, RESERVATION_LIST_PAGE_SIZE } from '@chuckkey/core';
import { createMachine, createMember } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const HOUR = 3_600_000;

async function reservation(machineId: string, memberId: string, start: Date, fields: Record<string, unknown> = {}) {
  const end = new Date(start.getTime() + HOUR);
  const [row] = await ctx.db('reservations')
    .insert({ machine_id: machineId, member_id: memberId, starts_at: start, ends_at: end, blocked_until: end, ...fields })
    .returning(['id']);
  return row.id as string;
}

const query = (params: Record<string, string | number>) => `?${new URLSearchParams(Object.entries(params).map(([k, v]): [string, string] => [k, String(v)]))}`;

describe('GET /api/reservations (admins)', () => {
  it('lists everyone’s reservations earliest first, filtered by machine, status and an overlapping time range', async () => {
    const machine = await createMachine(ctx.db, { name: `Band saw ${Date.now()}`, reservable: true });
    const member = await createMember(ctx.db, { first_name: 'Perrin', last_name: 'Lowe' });
    const base = new Date('2030-06-03T09:00:00Z');
    const first = await reservation(machine.id, member.id, base);
    const second = await reservation(machine.id, member.id, new Date(base.getTime() + 3 * HOUR), { status: 'cancelled', cancelled_at: base });
    const third = await reservation(machine.id, member.id, new Date(base.getTime() + 24 * HOUR), { kind: 'class' });
    const admin = await signedIn(ctx, 'admin');

    const all = await admin.get(`/api/reservations${query({ machineId: machine.id })}`);
    expect(all.status).toBe(200);
    const list = reservationListSchema.parse(all.body);
    expect(list).toMatchObject({ total: 3, page: 1, pageSize: RESERVATION_LIST_PAGE_SIZE });
    expect(list.items.map((item) => item.id)).toEqual([first, second, third]);
    expect(list.items[0]).toEqual({
      id: first,
      machine: { id: machine.id, name: machine.name },
      member: { id: member.id, firstName: 'Perrin', lastName: 'Lowe' },
      start: base.toISOString(),
      end: new Date(base.getTime() + HOUR).toISOString(),
      status: 'active',
      kind: 'member',
    });

    const cancelled = reservationListSchema.parse((await admin.get(`/api/reservations${query({ machineId: machine.id, status: 'cancelled' })}`)).body);
    expect(cancelled.items.map((item) => item.id)).toEqual([second]);

    // A reservation from 09:00 to 10:00 overlaps a range from 09:30; the one from 12:00 does not overlap one ending then.
    const range = { machineId: machine.id, from: new Date(base.getTime() + HOUR / 2).toISOString(), to: new Date(base.getTime() + 3 * HOUR).toISOString() };
    expect(reservationListSchema.parse((await admin.get(`/api/reservations${query(range)}`)).body).items.map((item) => item.id)).toEqual([first]);

    const beyond = reservationListSchema.parse((await admin.get(`/api/reservations${query({ machineId: machine.id, page: 2 })}`)).body);
    expect(beyond).toMatchObject({ items: [], total: 3, page: 2 });
  });

  it('answers 400 to a status it does not know and a range that ends before it starts', async () => {
    const admin = await signedIn(ctx, 'admin');
    expect((await admin.get(`/api/reservations${query({ status: 'lost' })}`)).status).toBe(400);
    expect((await admin.get(`/api/reservations${query({ from: '2030-06-03T10:00:00Z', to: '2030-06-03T09:00:00Z' })}`)).status).toBe(400);
  });

  it('is for admins: 403 to a member or an instructor, 401 signed out', async () => {
    expect((await (await signedIn(ctx, 'member')).get('/api/reservations')).status).toBe(403);
    expect((await (await signedIn(ctx, 'instructor')).get('/api/reservations/export.csv')).status).toBe(403);
    expect((await request(ctx.app).get('/api/reservations')).status).toBe(401);
  });
});

describe('GET /api/reservations/export.csv', () => {
  it('answers an RFC 4180 attachment with the same filters, one record per reservation', async () => {
    const machine = await createMachine(ctx.db, { name: `Saw, "big" ${Date.now()}`, reservable: true });
    const member = await createMember(ctx.db, { first_name: 'Odo', last_name: 'Vance, Jr.' });
    const start = new Date('2030-07-01T13:00:00Z');
    const id = await reservation(machine.id, member.id, start);
    await reservation(machine.id, member.id, new Date(start.getTime() + 2 * HOUR), { status: 'no_show' });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(`/api/reservations/export.csv${query({ machineId: machine.id, status: 'active' })}`);

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    // RFC 6266 §4.1: the file name may be a token or a quoted string.
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?reservations\.csv"?$/);
    // RFC 4180, parsed back with papaparse.
    const parsed = Papa.parse<string[]>(res.text, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual(['Start', 'End', 'Machine', 'First name', 'Last name', 'Status', 'Kind', 'Reservation id', 'Machine id', 'Member id']);
    expect(parsed.data.slice(1)).toEqual([
      [start.toISOString(), new Date(start.getTime() + HOUR).toISOString(), machine.name, 'Odo', 'Vance, Jr.', 'active', 'member', id, machine.id, member.id],
    ]);
  });
});
