import { describe, expect, it } from 'vitest';
import { demoAccounts } from '../seeds/02_people';
import { demoWeeklyHours } from '../seeds/08_shop_hours';
import { USAGE_HISTORY_DAYS } from '../seeds/14_usage_history';
import { ownDatabase } from './test-database';

const own = ownDatabase('usage_history_seed', { seed: true });

const DAY = 86_400_000;
const ISO_WEEKDAY: Record<string, number> = { Mon: 1, Tue: 2, Wed: 3, Thu: 4, Fri: 5, Sat: 6, Sun: 7 };
/** ISO weekday and wall-clock 'HH:MM' of an instant in the zone, as the IANA tz database through Intl gives them. */
function wallClock(instant: Date, timeZone: string): { weekday: number; time: string } {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return { weekday: ISO_WEEKDAY[part('weekday')] ?? 0, time: `${part('hour')}:${part('minute')}` };
}

describe('the demo shop’s three months of usage history', () => {
  it('has sessions over the last three months, all ended, each inside one of the shop’s openings', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const sessions = await own.db('machine_sessions').select('started_at', 'ended_at', 'hours');
    expect(sessions.length).toBeGreaterThan(1_000);
    expect(await own.db('machine_sessions').whereNull('ended_at')).toEqual([]);
    const now = Date.now();
    for (const s of sessions) {
      expect(s.ended_at.getTime()).toBeLessThan(now);
      expect(s.started_at.getTime()).toBeGreaterThan(now - (USAGE_HISTORY_DAYS + 2) * DAY);
      const start = wallClock(s.started_at, timeZone);
      const end = wallClock(s.ended_at, timeZone);
      // 'HH:MM' compares as text in the order of the day; a session never crosses midnight here.
      const opening = demoWeeklyHours.find((h) => h.weekday === start.weekday && h.opensAt <= start.time && end.time <= h.closesAt);
      expect(opening, `${s.started_at.toISOString()} (${start.weekday} ${start.time}–${end.time})`).toBeDefined();
      expect(end.weekday).toBe(start.weekday);
      expect(Number(s.hours)).toBeCloseTo((s.ended_at.getTime() - s.started_at.getTime()) / 3_600_000, 2);
    }
  });

  it('stays within each machine’s meter, which it leaves as the machines seed set it', async () => {
    const { rows } = await own.db.raw<{ rows: { name: string; meter_hours: string; used: string | null }[] }>(
      'select m.name, m.meter_hours, sum(s.hours) as used from machines m left join machine_sessions s on s.machine_id = m.id group by m.id',
    );
    for (const row of rows) expect(Number(row.used ?? 0), row.name).toBeLessThanOrEqual(Number(row.meter_hours));
  });

  it('has reservations used, cancelled and not turned up to, the no-shows all older than a month', async () => {
    const { rows: byStatus } = await own.db.raw<{ rows: { status: string; count: string }[] }>(
      'select status, count(*) from reservations where starts_at < now() group by status',
    );
    const count = (status: string) => Number(byStatus.find((row) => row.status === status)?.count ?? 0);
    expect(count('checked_in')).toBeGreaterThan(100);
    expect(count('cancelled')).toBeGreaterThan(10);
    expect(count('no_show')).toBeGreaterThan(10);
    // Rules' longest no-show window is a month by default (30 days): nobody is suspended by the history.
    const recent = await own.db('reservations').where({ status: 'no_show' }).where('starts_at', '>', new Date(Date.now() - 31 * DAY));
    expect(recent).toEqual([]);
  });

  it('leaves the accounts README lists out of it: no sessions, history reservations or denials of theirs', async () => {
    const ids = (await own.db('members').whereIn('email', demoAccounts.map((a) => a.email)).select('id')).map((row) => row.id);
    expect(ids).toHaveLength(3);
    expect(await own.db('machine_sessions').whereIn('member_id', ids)).toEqual([]);
    expect(await own.db('station_denials').whereIn('member_id', ids)).toEqual([]);
    // The history's reservations were each made three days ahead; the other seeds' are not.
    expect(await own.db('reservations').whereIn('member_id', ids).whereRaw("created_at = starts_at - interval '3 days'")).toEqual([]);
  });

  it('has refused scans by reason, the sign-off ones naming a training of the machine and unknown badges no member', async () => {
    const rows = await own.db('station_denials').select('code', 'rule', 'member_id', 'training_id', 'machine_id');
    expect(new Set(rows.map((r) => r.code))).toEqual(new Set(['sign_off_missing', 'sign_off_expired', 'waiver_missing', 'machine_in_use', 'supervisor_required', 'unknown_badge']));
    const links = await own.db('machine_trainings').select('machine_id', 'training_id');
    for (const row of rows) {
      if (row.code.startsWith('sign_off_')) expect(links.some((l) => l.machine_id === row.machine_id && l.training_id === row.training_id)).toBe(true);
      else expect(row.training_id).toBeNull();
      if (row.code === 'unknown_badge') expect(row).toMatchObject({ member_id: null, rule: null });
      else expect(row.member_id).not.toBeNull();
    }
  });
});
