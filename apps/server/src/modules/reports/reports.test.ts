import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { usageReportSchema } from '@chuckkey/core';
import { createMachine, createMember, createSignOff, createTraining, type CreatedMember } from '@chuckkey/db/factories';
import { browser, createTestContext, ownDatabase, signedIn, type Browser, type TestContext } from '../../test/harness';

// A database of its own: the report is shop-wide (every machine, session and reservation), and
// the tests set the shop's hours and time zone.
let ctx: TestContext;
let admin: Browser;
beforeAll(async () => {
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('reports') });
  admin = await signedIn(ctx, 'admin');
});
afterAll(() => ctx.close());

const at = (iso: string) => new Date(iso);

async function session(machineId: string, memberId: string, startedAt: string, endedAt: string) {
  const hours = (Date.parse(endedAt) - Date.parse(startedAt)) / 3_600_000;
  await ctx.db('machine_sessions').insert({
    machine_id: machineId,
    member_id: memberId,
    started_at: at(startedAt),
    ended_at: at(endedAt),
    ended_by: 'member',
    hours,
  });
}

async function setShop(timeZone: string, hours: { weekday: number; opensAt: string; closesAt: string }[]) {
  await ctx.db('shop').where({ id: 1 }).update({ time_zone: timeZone });
  await ctx.db('shop_hours').delete();
  if (hours.length > 0) await ctx.db('shop_hours').insert(hours.map((h) => ({ weekday: h.weekday, opens_at: h.opensAt, closes_at: h.closesAt })));
}

/*
 * The hand-computed history, shop clock UTC, range Monday 2026-03-02 … Tuesday 2026-03-03, shop
 * open 09:00–17:00 on Mondays and Tuesdays: 2 days × 8 h = 16 open hours.
 *
 *   lathe, Xenia:  Mon 10:30–12:00  1.5 h across the 11:00 boundary, all inside open hours
 *   lathe, Xenia:  Tue 16:00–18:00  2 h, 16–17 inside open hours, 17–18 after closing
 *   mill,  Yusuf:  Mon 23:00–Tue 01:00  2 h across midnight, all outside open hours
 *   mill,  Yusuf:  Sun 23:30–Mon 00:30  started before the range: 0.5 h of it falls inside
 *
 * Hours count all use inside the range (outside open hours too, clipped to the range only):
 *   lathe 1.5 + 2 = 3.5 h in 2 sessions; mill 2 + 0.5 = 2.5 h in 1 session (the Sunday one started
 *   before the range, so it adds hours but is not counted as one of the range's sessions).
 * Utilization counts only use inside open hours (clipped to them):
 *   lathe (1.5 + 1) / 16 = 0.15625 → 0.1563 (four places); mill 0 / 16 = 0.
 * Heatmap (ISO weekday, hour → hours): Mon 0 → 0.5, Mon 10 → 0.5, Mon 11 → 1, Mon 23 → 1,
 *   Tue 0 → 1, Tue 16 → 1, Tue 17 → 1.
 * Days: Mon 0.5 + 1.5 + 1 = 3 h, 2 sessions started; Tue 1 + 2 = 3 h, 1 session started.
 * Members: Xenia 3.5 h in 2 sessions, Yusuf 2.5 h in 1, busiest first.
 */
describe('GET /api/reports/usage over a hand-computed history', () => {
  let lathe: { id: string };
  let mill: { id: string };
  let xenia: CreatedMember;
  let yusuf: CreatedMember;
  let welding: { id: string };
  let milling: { id: string };
  let instructorA: CreatedMember;
  let instructorB: CreatedMember;
  const range = 'from=2026-03-02&to=2026-03-03';

  beforeAll(async () => {
    await setShop('UTC', [
      { weekday: 1, opensAt: '09:00', closesAt: '17:00' },
      { weekday: 2, opensAt: '09:00', closesAt: '17:00' },
    ]);
    lathe = await createMachine(ctx.db, { name: 'Report lathe' });
    mill = await createMachine(ctx.db, { name: 'Report mill', category: 'mill' });
    xenia = await createMember(ctx.db, { first_name: 'Xenia', last_name: 'Report' });
    yusuf = await createMember(ctx.db, { first_name: 'Yusuf', last_name: 'Report' });
    await session(lathe.id, xenia.id, '2026-03-02T10:30:00Z', '2026-03-02T12:00:00Z');
    await session(lathe.id, xenia.id, '2026-03-03T16:00:00Z', '2026-03-03T18:00:00Z');
    await session(mill.id, yusuf.id, '2026-03-02T23:00:00Z', '2026-03-03T01:00:00Z');
    await session(mill.id, yusuf.id, '2026-03-01T23:30:00Z', '2026-03-02T00:30:00Z');
    // Wednesday's session lies after the range and counts nowhere.
    await session(mill.id, xenia.id, '2026-03-04T10:00:00Z', '2026-03-04T11:00:00Z');

    // Reservations starting in the range: made 4, used 2 (checked in, one of them released early), 1 no-show, 1 cancelled.
    const reservation = (machineId: string, startsAt: string, fields: Record<string, unknown>) => {
      const starts = at(startsAt);
      const ends = new Date(starts.getTime() + 3_600_000);
      return { machine_id: machineId, member_id: xenia.id, starts_at: starts, ends_at: ends, blocked_until: ends, ...fields };
    };
    await ctx.db('reservations').insert([
      reservation(lathe.id, '2026-03-02T10:00:00Z', { status: 'checked_in', checked_in_at: at('2026-03-02T10:02:00Z') }),
      reservation(lathe.id, '2026-03-02T13:00:00Z', { status: 'released', checked_in_at: at('2026-03-02T13:01:00Z'), released_at: at('2026-03-02T13:30:00Z') }),
      reservation(lathe.id, '2026-03-03T10:00:00Z', { status: 'no_show' }),
      reservation(mill.id, '2026-03-03T10:00:00Z', { status: 'cancelled', cancelled_at: at('2026-03-01T08:00:00Z') }),
      reservation(mill.id, '2026-03-05T10:00:00Z', { status: 'checked_in', checked_in_at: at('2026-03-05T10:00:00Z') }),
    ]);

    welding = await createTraining(ctx.db, { name: 'Report welding basics' });
    milling = await createTraining(ctx.db, { name: 'Report milling basics' });
    const denial = (code: string, rule: number | null, when: string, trainingId: string | null = null, memberId: string | null = yusuf.id) => ({
      at: at(when),
      machine_id: mill.id,
      member_id: code === 'unknown_badge' ? null : memberId,
      code,
      rule,
      training_id: trainingId,
    });
    await ctx.db('station_denials').insert([
      denial('sign_off_missing', 2, '2026-03-02T10:00:00Z', welding.id),
      denial('sign_off_missing', 2, '2026-03-02T11:00:00Z', welding.id),
      denial('sign_off_expired', 2, '2026-03-03T09:30:00Z', welding.id),
      denial('sign_off_missing', 2, '2026-03-03T09:40:00Z', milling.id),
      denial('unknown_badge', null, '2026-03-03T12:00:00Z'),
      denial('shop_closed', 7, '2026-03-03T20:00:00Z'),
      // The day after the range.
      denial('sign_off_missing', 2, '2026-03-04T10:00:00Z', milling.id),
    ]);

    instructorA = await createMember(ctx.db, { role: 'instructor', first_name: 'Agnes', last_name: 'Report' });
    instructorB = await createMember(ctx.db, { role: 'instructor', first_name: 'Bruno', last_name: 'Report' });
    await createSignOff(ctx.db, { member_id: xenia.id, training_id: welding.id, signed_by: instructorA.id, signed_at: at('2026-03-02T15:00:00Z') });
    await createSignOff(ctx.db, { member_id: yusuf.id, training_id: welding.id, signed_by: instructorA.id, signed_at: at('2026-03-03T15:00:00Z') });
    await createSignOff(ctx.db, { member_id: yusuf.id, training_id: milling.id, signed_by: instructorB.id, signed_at: at('2026-03-03T16:00:00Z') });
    await createSignOff(ctx.db, { member_id: xenia.id, training_id: milling.id, signed_by: instructorB.id, signed_at: at('2026-02-20T16:00:00Z') });
  });

  it('by machine: hours, sessions, open hours and utilization as worked out above', async () => {
    const res = await admin.get(`/api/reports/usage?${range}&groupBy=machine`);
    expect(res.status).toBe(200);
    const report = usageReportSchema.parse(res.body);
    expect(report).toMatchObject({ from: '2026-03-02', to: '2026-03-03', timeZone: 'UTC', groupBy: 'machine' });
    expect(report.rows).toEqual([
      { machineId: lathe.id, machineName: 'Report lathe', sessions: 2, hours: 3.5, openHours: 16, utilization: 0.1563 },
      { machineId: mill.id, machineName: 'Report mill', sessions: 1, hours: 2.5, openHours: 16, utilization: 0 },
    ]);
  });

  it('spreads each session over the hours of the shop clock it covers', async () => {
    const report = usageReportSchema.parse((await admin.get(`/api/reports/usage?${range}`)).body);
    expect(report.heatmap).toEqual([
      { weekday: 1, hour: 0, hours: 0.5 },
      { weekday: 1, hour: 10, hours: 0.5 },
      { weekday: 1, hour: 11, hours: 1 },
      { weekday: 1, hour: 23, hours: 1 },
      { weekday: 2, hour: 0, hours: 1 },
      { weekday: 2, hour: 16, hours: 1 },
      { weekday: 2, hour: 17, hours: 1 },
    ]);
  });

  it('by day and by member, busiest member first', async () => {
    const days = usageReportSchema.parse((await admin.get(`/api/reports/usage?${range}&groupBy=day`)).body);
    expect(days.rows).toEqual([
      { date: '2026-03-02', sessions: 2, hours: 3 },
      { date: '2026-03-03', sessions: 1, hours: 3 },
    ]);
    const members = usageReportSchema.parse((await admin.get(`/api/reports/usage?${range}&groupBy=member`)).body);
    expect(members.rows).toEqual([
      { memberId: xenia.id, memberName: 'Xenia Report', sessions: 2, hours: 3.5 },
      { memberId: yusuf.id, memberName: 'Yusuf Report', sessions: 1, hours: 2.5 },
    ]);
  });

  it('counts reservations, denials by reason, trainings in demand and sign-offs per instructor in the range', async () => {
    const report = usageReportSchema.parse((await admin.get(`/api/reports/usage?${range}`)).body);
    expect(report.reservations).toEqual({ made: 4, used: 2, noShows: 1, cancelled: 1 });
    // Most first; ties by code.
    expect(report.denials).toEqual([
      { code: 'sign_off_missing', rule: 2, count: 3 },
      { code: 'shop_closed', rule: 7, count: 1 },
      { code: 'sign_off_expired', rule: 2, count: 1 },
      { code: 'unknown_badge', rule: null, count: 1 },
    ]);
    expect(report.trainingsInDemand).toEqual([
      { trainingId: welding.id, trainingName: 'Report welding basics', count: 3 },
      { trainingId: milling.id, trainingName: 'Report milling basics', count: 1 },
    ]);
    expect(report.signOffs).toEqual([
      { instructorId: instructorA.id, instructorName: 'Agnes Report', count: 2 },
      { instructorId: instructorB.id, instructorName: 'Bruno Report', count: 1 },
    ]);
  });

  it('takes closures off the open hours', async () => {
    const [closure] = await ctx.db('shop_closures').insert({ starts_on: '2026-03-03', ends_on: '2026-03-03', reason: 'Stocktaking' }).returning('id');
    try {
      const report = usageReportSchema.parse((await admin.get(`/api/reports/usage?${range}`)).body);
      // Monday alone is open: 8 h. The lathe's use inside it is Monday's 1.5 h: 1.5 / 8 = 0.1875.
      expect(report.rows[0]).toMatchObject({ machineName: 'Report lathe', openHours: 8, utilization: 0.1875 });
    } finally {
      await ctx.db('shop_closures').where({ id: closure.id }).delete();
    }
  });

  it('exports each table as RFC 4180 CSV that an independent parser reads back', async () => {
    const res = await admin.get(`/api/reports/usage?${range}&groupBy=machine&format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    // RFC 6266: a file name of token characters goes unquoted.
    expect(res.headers['content-disposition']).toBe('attachment; filename=usage-machine-2026-03-02-to-2026-03-03.csv');
    // RFC 4180 §2.1: each record ends with CRLF.
    expect(res.text.endsWith('\r\n')).toBe(true);
    // RFC 4180, read by papaparse as the independent parser.
    const machines = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
    expect(machines.errors).toEqual([]);
    expect(machines.data).toEqual([
      { Machine: 'Report lathe', Sessions: '2', Hours: '3.5', 'Open hours': '16', Utilization: '0.1563' },
      { Machine: 'Report mill', Sessions: '1', Hours: '2.5', 'Open hours': '16', Utilization: '0' },
    ]);

    const heatmap = await admin.get(`/api/reports/usage?${range}&format=csv&table=heatmap`);
    expect(heatmap.headers['content-disposition']).toBe('attachment; filename=usage-heatmap-2026-03-02-to-2026-03-03.csv');
    const cells = Papa.parse<Record<string, string>>(heatmap.text, { header: true, skipEmptyLines: true });
    expect(cells.data).toHaveLength(7);
    expect(cells.data[2]).toEqual({ Weekday: '1', Hour: '11', Hours: '1' });

    const denials = Papa.parse<Record<string, string>>((await admin.get(`/api/reports/usage?${range}&format=csv&table=denials`)).text, { header: true, skipEmptyLines: true });
    expect(denials.data[3]).toEqual({ Reason: 'unknown_badge', Rule: '', Count: '1' });

    const reservations = Papa.parse<string[]>((await admin.get(`/api/reports/usage?${range}&format=csv&table=reservations`)).text, { skipEmptyLines: true });
    expect(reservations.data).toEqual([
      ['Made', 'Used', 'No-shows', 'Cancelled'],
      ['4', '2', '1', '1'],
    ]);

    const trainings = await admin.get(`/api/reports/usage?${range}&format=csv&table=trainings`);
    expect(Papa.parse(trainings.text, { header: true, skipEmptyLines: true }).data).toEqual([
      { Training: 'Report welding basics', Refusals: '3' },
      { Training: 'Report milling basics', Refusals: '1' },
    ]);
    const signOffs = await admin.get(`/api/reports/usage?${range}&format=csv&table=signOffs`);
    expect(signOffs.headers['content-disposition']).toBe('attachment; filename=usage-sign-offs-2026-03-02-to-2026-03-03.csv');
    expect(Papa.parse(signOffs.text, { header: true, skipEmptyLines: true }).data).toEqual([
      { Instructor: 'Agnes Report', 'Sign-offs': '2' },
      { Instructor: 'Bruno Report', 'Sign-offs': '1' },
    ]);
  });
});

describe('GET /api/reports/usage across a daylight-saving change', () => {
  /*
   * America/Chicago on Sunday 2026-03-08 (IANA tz database, read here through Intl): the clock
   * jumps from 02:00 CST to 03:00 CDT, so the shop day has 23 hours. Open all day on Sundays,
   * 00:00–24:00: 23 open hours. One session 01:30 CST (07:30Z) – 03:30 CDT (08:30Z) is one hour of
   * real time: half in the wall clock's hour 1 and half in its hour 3; hour 2 never happened.
   * Utilization 1 / 23 = 0.04348 → 0.0435.
   */
  const wallClock = (iso: string) =>
    new Intl.DateTimeFormat('en-GB', { timeZone: 'America/Chicago', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at(iso));

  it('counts the real hours of the short day and the wall clock’s hours of the session', async () => {
    expect(wallClock('2026-03-08T07:30:00Z')).toBe('01:30');
    expect(wallClock('2026-03-08T08:30:00Z')).toBe('03:30');
    await setShop('America/Chicago', [{ weekday: 7, opensAt: '00:00', closesAt: '24:00' }]);
    try {
      const machine = await createMachine(ctx.db, { name: 'Report band saw', category: 'band_saw' });
      const member = await createMember(ctx.db);
      await session(machine.id, member.id, '2026-03-08T07:30:00Z', '2026-03-08T08:30:00Z');
      const report = usageReportSchema.parse((await admin.get('/api/reports/usage?from=2026-03-08&to=2026-03-08&groupBy=machine')).body);
      expect(report.timeZone).toBe('America/Chicago');
      expect(report.rows.find((r) => 'machineId' in r && r.machineId === machine.id)).toMatchObject({ sessions: 1, hours: 1, openHours: 23, utilization: 0.0435 });
      expect(report.heatmap).toEqual([
        { weekday: 7, hour: 1, hours: 0.5 },
        { weekday: 7, hour: 3, hours: 0.5 },
      ]);
      const days = usageReportSchema.parse((await admin.get('/api/reports/usage?from=2026-03-08&to=2026-03-08&groupBy=day')).body);
      expect(days.rows).toEqual([{ date: '2026-03-08', sessions: 1, hours: 1 }]);
    } finally {
      await setShop('UTC', [
        { weekday: 1, opensAt: '09:00', closesAt: '17:00' },
        { weekday: 2, opensAt: '09:00', closesAt: '17:00' },
      ]);
    }
  });
});

describe('GET /api/reports/usage with a session still running', () => {
  it('counts a running session up to now, and once it ends, from the kept totals', async () => {
    const machine = await createMachine(ctx.db, { name: 'Report drill press', category: 'drill_press' });
    const member = await createMember(ctx.db, { first_name: 'Zora', last_name: 'Report' });
    // Started 30 minutes ago; yesterday and today (the shop clock is UTC here) hold all of it.
    const startedAt = new Date(Date.now() - 30 * 60_000);
    const today = new Date().toISOString().slice(0, 10);
    const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
    const [row] = await ctx.db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id, started_at: startedAt }).returning('id');
    const figures = async () => {
      const report = usageReportSchema.parse((await admin.get(`/api/reports/usage?from=${yesterday}&to=${today}&groupBy=machine`)).body);
      return report.rows.find((r) => 'machineId' in r && r.machineId === machine.id);
    };
    // 30 minutes and the second or so the request takes: 0.5 h to the hundredth.
    expect(await figures()).toMatchObject({ sessions: 1, hours: 0.5 });
    const members = usageReportSchema.parse((await admin.get(`/api/reports/usage?from=${yesterday}&to=${today}&groupBy=member`)).body);
    expect(members.rows.find((r) => 'memberId' in r && r.memberId === member.id)).toMatchObject({ sessions: 1, hours: 0.5 });

    // Ended at 45 minutes: the trigger's totals now carry it, and the figure follows the end.
    await ctx.db('machine_sessions').where({ id: row.id }).update({ ended_at: new Date(startedAt.getTime() + 45 * 60_000), ended_by: 'member', hours: 0.75 });
    expect(await figures()).toMatchObject({ sessions: 1, hours: 0.75 });
  });
});

describe('who may read the usage report, and which ranges', () => {
  it('signed out answers 401; a member or an instructor 403', async () => {
    expect((await (await browser(ctx)).get('/api/reports/usage?from=2026-03-02&to=2026-03-03')).status).toBe(401);
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.get('/api/reports/usage?from=2026-03-02&to=2026-03-03');
      expect(res.status, role).toBe(403);
      expect(res.body.code).toBe('forbidden');
      expect((await client.get('/api/reports/usage?from=2026-03-02&to=2026-03-03&format=csv')).status, role).toBe(403);
    }
  });

  it('refuses a bad range with 400 and says which field', async () => {
    for (const query of [
      'to=2026-03-03',
      'from=2026-03-32&to=2026-04-02',
      'from=2026-03-03&to=2026-03-02',
      // 2025-01-01 … 2026-02-05 is 401 days, both counted.
      'from=2025-01-01&to=2026-02-05',
      'from=2026-03-02&to=2026-03-03&groupBy=week',
      'from=2026-03-02&to=2026-03-03&format=csv&table=everything',
    ]) {
      const res = await admin.get(`/api/reports/usage?${query}`);
      expect(res.status, query).toBe(400);
      expect(res.body.code, query).toBe('validation_failed');
    }
    // 2025-01-01 … 2026-02-04 is 400 days: the longest range taken.
    expect((await admin.get('/api/reports/usage?from=2025-01-01&to=2026-02-04')).status).toBe(200);
  });
});
