import type { Knex } from 'knex';
import { describe, expect, it } from 'vitest';
import { createMachine } from '../factories';
import { ownMigratedDatabase } from './test-database';

/*
 * usage_machine_hours and usage_member_days are kept by triggers (migration
 * 20261206000000_create_usage_totals, docs/decisions/016). Whatever happens to the sessions, the
 * kept totals must equal (1) the totals worked out here in JavaScript, the hours labelled by the
 * wall clock through Intl (the IANA tz database as the JavaScript engine carries it, not
 * PostgreSQL's copy), and (2) a rebuild from the sessions by the database.
 *
 * The shop clock is America/Chicago, and the history runs over Sunday 2026-11-01, when the clock
 * goes from 02:00 CDT back to 01:00 CST (IANA tz database): the hour 01:00 happens twice.
 * Chicago's offsets are whole hours, so its wall-clock hours begin on the UTC hours.
 */
const ZONE = 'America/Chicago';
const own = ownMigratedDatabase('usage_totals', async (db) => {
  await db('shop').where({ id: 1 }).update({ time_zone: ZONE });
  // Open 10:00–18:00 every day of the week, so each hour's open part is either all or none of it.
  await db('shop_hours').insert([1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, opens_at: '10:00', closes_at: '18:00' })));
  await db.raw('select usage_totals_refresh()');
});

const HOUR_MS = 3_600_000;
const wall = new Intl.DateTimeFormat('en-CA', {
  timeZone: ZONE,
  year: 'numeric',
  month: '2-digit',
  day: '2-digit',
  hour: '2-digit',
  weekday: 'short',
  hourCycle: 'h23',
});
const ISO_WEEKDAY: Record<string, number> = { Mon: 1, Tue: 2, Wed: 3, Thu: 4, Fri: 5, Sat: 6, Sun: 7 };

function label(ms: number): { day: string; weekday: number; hour: number } {
  const parts = Object.fromEntries(wall.formatToParts(new Date(ms)).map((p) => [p.type, p.value]));
  return { day: `${parts.year}-${parts.month}-${parts.day}`, weekday: ISO_WEEKDAY[parts.weekday ?? ''] ?? 0, hour: Number(parts.hour) };
}

interface Session {
  machineId: string;
  memberId: string;
  startedAt: number;
  endedAt: number | null;
}

/** The totals as this test counts them: each ended session cut at the UTC hours (Chicago's wall-clock hours). */
function expected(sessions: Session[]) {
  const machines = new Map<string, { machine: string; hour: string; day: string; weekday: number; hourOfDay: number; micros: number; openMicros: number; started: number }>();
  const members = new Map<string, { member: string; day: string; micros: number; started: number }>();
  for (const s of sessions) {
    if (s.endedAt === null || s.endedAt <= s.startedAt) continue;
    for (let hour = Math.floor(s.startedAt / HOUR_MS) * HOUR_MS; hour < s.endedAt; hour += HOUR_MS) {
      const micros = (Math.min(s.endedAt, hour + HOUR_MS) - Math.max(s.startedAt, hour)) * 1000;
      const started = hour <= s.startedAt ? 1 : 0;
      const l = label(hour);
      // Open 10:00–18:00 on the wall clock; no closures in this history.
      const open = l.hour >= 10 && l.hour < 18 ? micros : 0;
      const mk = `${s.machineId} ${hour}`;
      const m = machines.get(mk) ?? { machine: s.machineId, hour: new Date(hour).toISOString(), day: l.day, weekday: l.weekday, hourOfDay: l.hour, micros: 0, openMicros: 0, started: 0 };
      m.micros += micros;
      m.openMicros += open;
      m.started += started;
      machines.set(mk, m);
      const pk = `${s.memberId} ${l.day}`;
      const p = members.get(pk) ?? { member: s.memberId, day: l.day, micros: 0, started: 0 };
      p.micros += micros;
      p.started += started;
      members.set(pk, p);
    }
  }
  const byKey = <T>(map: Map<string, T>) => [...map.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).map(([, v]) => v);
  return { machines: byKey(machines), members: byKey(members) };
}

/** What the tables hold, rows left at nothing by a share taken away left out. */
async function kept(db: Knex) {
  const machines = await db.raw<{ rows: Record<string, unknown>[] }>(`
    select machine_id, hour, to_char(day, 'YYYY-MM-DD') as day, weekday, hour_of_day, micros, open_micros, started
    from usage_machine_hours where micros <> 0 or started <> 0 order by machine_id::text || ' ' || (extract(epoch from hour) * 1000)::bigint::text`);
  const members = await db.raw<{ rows: Record<string, unknown>[] }>(`
    select member_id, to_char(day, 'YYYY-MM-DD') as day, micros, started
    from usage_member_days where micros <> 0 or started <> 0 order by member_id::text || ' ' || to_char(day, 'YYYY-MM-DD')`);
  return {
    machines: machines.rows.map((r) => ({
      machine: r.machine_id,
      hour: new Date(r.hour as string).toISOString(),
      day: r.day,
      weekday: r.weekday,
      hourOfDay: r.hour_of_day,
      micros: Number(r.micros),
      openMicros: Number(r.open_micros),
      started: r.started,
    })),
    members: members.rows.map((r) => ({ member: r.member_id, day: r.day, micros: Number(r.micros), started: r.started })),
  };
}

/** The database's own rebuild from the sessions, read and then undone. */
async function rebuiltTotals(db: Knex) {
  let totals: Awaited<ReturnType<typeof kept>> | undefined;
  await db
    .transaction(async (trx) => {
      await trx.raw('select usage_totals_rebuild()');
      totals = await kept(trx);
      throw new RolledBack();
    })
    .catch((error: unknown) => {
      if (!(error instanceof RolledBack)) throw error;
    });
  if (!totals) throw new Error('the rebuild read nothing');
  return totals;
}
class RolledBack extends Error {}

/** A small generator of its own, so every run makes the same history. */
function numbers(seed: number) {
  let state = seed;
  return (below: number) => {
    state = (state * 1_103_515_245 + 12_345) % 2_147_483_648;
    return state % below;
  };
}

async function people(db: Knex, count: number, prefix: string): Promise<string[]> {
  const rows = await db('members')
    .insert(Array.from({ length: count }, (_, i) => ({ email: `${prefix}${i}@totals.example`, first_name: `${prefix}${i}`, last_name: 'Totals', role: 'member', password_hash: 'x' })))
    .returning('id');
  return rows.map((r: { id: string }) => r.id);
}

async function machines(db: Knex, count: number, prefix: string): Promise<string[]> {
  const ids: string[] = [];
  for (let i = 0; i < count; i += 1) ids.push((await createMachine(db, { name: `${prefix} ${i}` })).id);
  return ids;
}

const row = (s: Session) => ({
  machine_id: s.machineId,
  member_id: s.memberId,
  started_at: new Date(s.startedAt),
  ended_at: s.endedAt === null ? null : new Date(s.endedAt),
  ended_by: s.endedAt === null ? null : 'member',
  hours: s.endedAt === null ? null : Math.round((s.endedAt - s.startedAt) / 36_000) / 100,
});

describe('usage totals kept by triggers', () => {
  it('stay equal to the wall-clock count and to a rebuild as sessions start, end, change, move and go, over the night the clock falls back', async () => {
    const db = own.db;
    const next = numbers(20_261_101);
    const machineIds = await machines(db, 3, 'Totals lathe');
    const memberIds = await people(db, 4, 'Totals');
    // Saturday 2026-10-31 12:00 CDT (17:00Z) onwards, for two days.
    const origin = Date.parse('2026-10-31T17:00:00Z');
    const sessions = new Map<string, Session>();
    const random = (): Session => {
      const startedAt = origin + next(48 * 60) * 60_000 + next(60) * 1000;
      return { machineId: machineIds[next(3)] ?? '', memberId: memberIds[next(4)] ?? '', startedAt, endedAt: startedAt + next(5 * 60) * 60_000 + next(60) * 1000 };
    };

    // One multi-row insert of ended sessions: the trigger sums a statement's rows together.
    const first = Array.from({ length: 40 }, random);
    const ids = await db('machine_sessions').insert(first.map(row)).returning('id');
    ids.forEach((r: { id: string }, i) => sessions.set(r.id, first[i] as Session));
    // One that crosses the repeated hour: 00:30 CDT (05:30Z) to 01:30 CST (07:30Z) is two real hours.
    const overNight = { machineId: machineIds[0] ?? '', memberId: memberIds[0] ?? '', startedAt: Date.parse('2026-11-01T05:30:00Z'), endedAt: Date.parse('2026-11-01T07:30:00Z') };
    const [night] = await db('machine_sessions').insert(row(overNight)).returning('id');
    sessions.set(night.id, overNight);
    // A session of no length counts nowhere.
    const instant = { machineId: machineIds[1] ?? '', memberId: memberIds[1] ?? '', startedAt: origin + 90_000, endedAt: origin + 90_000 };
    const [none] = await db('machine_sessions').insert(row(instant)).returning('id');
    sessions.set(none.id, instant);

    const check = async (when: string) => {
      const totals = await kept(db);
      expect(totals, when).toEqual(expected([...sessions.values()]));
      expect(totals, when).toEqual(await rebuiltTotals(db));
    };
    await check('after the inserts');
    // 06:00Z is 01:00 CDT and 07:00Z is 01:00 CST: two rows, both the wall clock's hour 1 of Sunday.
    const repeated = (await kept(db)).machines.filter((m) => m.machine === machineIds[0] && ['2026-11-01T06:00:00.000Z', '2026-11-01T07:00:00.000Z'].includes(m.hour));
    expect(repeated.map((m) => [m.day, m.weekday, m.hourOfDay])).toEqual([
      ['2026-11-01', 7, 1],
      ['2026-11-01', 7, 1],
    ]);

    // A running session counts nowhere until it ends; then its share comes in.
    const running = { machineId: machineIds[2] ?? '', memberId: memberIds[2] ?? '', startedAt: origin + 3 * HOUR_MS + 17_000, endedAt: null as number | null };
    const [open] = await db('machine_sessions').insert(row(running)).returning('id');
    sessions.set(open.id, running);
    await check('with a session running');
    running.endedAt = running.startedAt + 2 * HOUR_MS + 123_456;
    await db('machine_sessions').where({ id: open.id }).update({ ended_at: new Date(running.endedAt), ended_by: 'member', hours: 2.03 });
    await check('after it ended');

    // Edits, moves to another machine or member, and deletes, each taking away its old share exactly.
    const keys = [...sessions.keys()];
    for (let round = 0; round < 12; round += 1) {
      const id = keys[next(keys.length)] ?? '';
      const s = sessions.get(id);
      if (!s) continue;
      const change = next(4);
      if (change === 0) {
        s.endedAt = s.startedAt + next(6 * 60) * 60_000 + 1;
        await db('machine_sessions').where({ id }).update({ ended_at: new Date(s.endedAt), ended_by: 'admin', hours: 1 });
      } else if (change === 1) {
        s.machineId = machineIds[next(3)] ?? '';
        s.memberId = memberIds[next(4)] ?? '';
        await db('machine_sessions').where({ id }).update({ machine_id: s.machineId, member_id: s.memberId });
      } else if (change === 2) {
        s.startedAt -= next(90) * 60_000;
        await db('machine_sessions').where({ id }).update({ started_at: new Date(s.startedAt) });
      } else {
        sessions.delete(id);
        keys.splice(keys.indexOf(id), 1);
        await db('machine_sessions').where({ id }).delete();
      }
      await check(`after change ${round} (${['end moved', 'machine and member moved', 'start moved', 'deleted'][change]})`);
    }
    // An update that touches none of the four columns changes nothing.
    const before = await kept(db);
    await db('machine_sessions').update({ checklist: JSON.stringify([{ id: 'checked', label: 'Checked' }]) });
    expect(await kept(db)).toEqual(before);
  });

  it('a closure added after the sessions ended takes the open part of its days away, and gives it back when removed', async () => {
    const db = own.db;
    const [machineId] = await machines(db, 1, 'Closure lathe');
    const [memberId] = await people(db, 1, 'Closure');
    // Tuesday 2026-11-10 and Wednesday 2026-11-11, 11:00–13:00 CST (17:00Z–19:00Z): open hours both.
    await db('machine_sessions').insert([
      row({ machineId: machineId ?? '', memberId: memberId ?? '', startedAt: Date.parse('2026-11-10T17:00:00Z'), endedAt: Date.parse('2026-11-10T19:00:00Z') }),
      row({ machineId: machineId ?? '', memberId: memberId ?? '', startedAt: Date.parse('2026-11-11T17:00:00Z'), endedAt: Date.parse('2026-11-11T19:00:00Z') }),
    ]);
    const openByDay = async () => {
      const { rows } = await db.raw<{ rows: { day: string; open: string; used: string }[] }>(
        `select to_char(day, 'YYYY-MM-DD') as day, sum(open_micros) as open, sum(micros) as used
         from usage_machine_hours where machine_id = ? group by day`,
        [machineId ?? ''],
      );
      return Object.fromEntries(rows.map((r) => [r.day, { open: Number(r.open) / HOUR_MS / 1000, used: Number(r.used) / HOUR_MS / 1000 }]));
    };
    expect(await openByDay()).toEqual({ '2026-11-10': { open: 2, used: 2 }, '2026-11-11': { open: 2, used: 2 } });

    const [closure] = await db('shop_closures').insert({ starts_on: '2026-11-11', ends_on: '2026-11-11', reason: 'Floor resurfacing' }).returning('id');
    expect(await openByDay()).toEqual({ '2026-11-10': { open: 2, used: 2 }, '2026-11-11': { open: 0, used: 2 } });
    await db('shop_closures').where({ id: closure.id }).update({ starts_on: '2026-11-10', ends_on: '2026-11-10' });
    expect(await openByDay()).toEqual({ '2026-11-10': { open: 0, used: 2 }, '2026-11-11': { open: 2, used: 2 } });
    await db('shop_closures').where({ id: closure.id }).delete();
    expect(await openByDay()).toEqual({ '2026-11-10': { open: 2, used: 2 }, '2026-11-11': { open: 2, used: 2 } });
    expect(await kept(db)).toEqual(await rebuiltTotals(db));
  });

  it('new weekly hours or a new time zone mark the totals stale, and the refresh works them out again once', async () => {
    const db = own.db;
    const stale = async () => (await db('usage_totals_state').first('stale').where({ id: 1 })).stale as boolean;
    expect(await stale()).toBe(false);
    await db('shop_hours').where({ weekday: 2 }).update({ opens_at: '12:00' });
    expect(await stale()).toBe(true);
    await db.raw('select usage_totals_refresh()');
    expect(await stale()).toBe(false);
    const [machineId] = await db('machines').where('name', 'like', 'Closure lathe%').pluck('id');
    // Tuesday 11:00–13:00 CST now has one open hour (12:00–13:00).
    const tuesday = await db('usage_machine_hours').where({ machine_id: machineId, day: '2026-11-10' }).sum({ open: 'open_micros' }).first();
    expect(Number(tuesday?.open) / HOUR_MS / 1000).toBe(1);

    await db('shop').where({ id: 1 }).update({ time_zone: 'UTC' });
    expect(await stale()).toBe(true);
    await db.raw('select usage_totals_refresh()');
    // On the UTC clock the Tuesday session, 17:00–19:00Z, starts in hour 17.
    const hours = await db('usage_machine_hours').where({ machine_id: machineId, day: '2026-11-10' }).orderBy('hour').pluck('hour_of_day');
    expect(hours).toEqual([17, 18]);
    await db('shop').where({ id: 1 }).update({ time_zone: ZONE });
    await db('shop_hours').where({ weekday: 2 }).update({ opens_at: '10:00' });
    await db.raw('select usage_totals_refresh()');
    expect(await kept(db)).toEqual(await rebuiltTotals(db));
  });

  it('a closure added while another transaction ends a session waits for it, and both shares land', async () => {
    const db = own.db;
    const [machineId] = await machines(db, 1, 'Race lathe');
    const [memberId] = await people(db, 1, 'Race');
    const [id] = await db('machine_sessions')
      .insert(row({ machineId: machineId ?? '', memberId: memberId ?? '', startedAt: Date.parse('2026-11-17T17:00:00Z'), endedAt: null }))
      .returning('id');
    const ending = await db.transaction();
    try {
      await ending('machine_sessions').where({ id: id.id }).update({ ended_at: new Date('2026-11-17T19:00:00Z'), ended_by: 'member', hours: 2 });
      // The closure's rebuild of the day waits for the ending's shared lock.
      let closed = false;
      const closing = db('shop_closures')
        .insert({ starts_on: '2026-11-17', ends_on: '2026-11-17', reason: 'Inventory' })
        .then(() => {
          closed = true;
        });
      await new Promise((resolve) => setTimeout(resolve, 300));
      expect(closed).toBe(false);
      await ending.commit();
      await closing;
    } catch (error) {
      await ending.rollback();
      throw error;
    }
    const day = await db('usage_machine_hours').where({ machine_id: machineId, day: '2026-11-17' }).sum({ used: 'micros', open: 'open_micros' }).first();
    expect({ used: Number(day?.used) / HOUR_MS / 1000, open: Number(day?.open) }).toEqual({ used: 2, open: 0 });
    expect(await kept(db)).toEqual(await rebuiltTotals(db));
  });
});
