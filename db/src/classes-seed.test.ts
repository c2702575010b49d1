import { describe, expect, it } from 'vitest';
import { demoClass } from '../seeds/10_classes';
import { ownDatabase } from './test-database';

const own = ownDatabase('classes_seed', { seed: true });

/** Weekday and wall-clock time of an instant in the zone, as the IANA tz database through Intl gives them. */
function wallClock(instant: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);
}

describe('the demo shop’s weekly lathe class', () => {
  it('meets six Saturdays from the coming one, 9:00–12:00 on the shop’s wall clock, held by the instructor with the demo member booked', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const cls = await own.db('classes as c').join('machines as m', 'm.id', 'c.machine_id').join('members as i', 'i.id', 'c.instructor_id').first('c.*', 'm.name as machine_name', 'i.email as instructor_email');
    expect(cls).toMatchObject({ title: demoClass.title, machine_name: demoClass.machineName, instructor_email: 'instructor@example.org', weeks: 6, cancelled_at: null });
    // RFC 5545 §3.3.10: a weekly rule bounded by COUNT.
    expect(cls.rrule).toBe('FREQ=WEEKLY;COUNT=6');

    const meetings = await own.db('reservations').where({ class_id: cls.id }).orderBy('starts_at').select('*');
    expect(meetings).toHaveLength(6);
    const now = Date.now();
    expect(meetings[0].starts_at.getTime()).toBeGreaterThan(now);
    // The coming Saturday is at most a week away.
    expect(meetings[0].starts_at.getTime() - now).toBeLessThanOrEqual(7 * 86_400_000);
    for (const meeting of meetings) {
      expect(meeting).toMatchObject({ kind: 'class', member_id: cls.instructor_id, machine_id: cls.machine_id });
      expect(wallClock(meeting.starts_at, timeZone)).toBe('Saturday 09:00');
      expect(wallClock(meeting.ends_at, timeZone)).toBe('Saturday 12:00');
    }

    const booked = await own.db('class_members as cm').join('members as p', 'p.id', 'cm.member_id').where({ 'cm.class_id': cls.id }).pluck('p.email');
    expect(booked).toEqual(['member@example.org']);
  });

  it('keeps the meetings that fall on a closure as cancelled, and every other one active', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const closures: { starts_on: string; ends_on: string }[] = await own.db('shop_closures').select(own.db.raw("to_char(starts_on, 'YYYY-MM-DD') as starts_on"), own.db.raw("to_char(ends_on, 'YYYY-MM-DD') as ends_on"));
    const meetings = await own.db('reservations').where({ kind: 'class' }).select('starts_at', 'status', 'cancelled_at');
    const shopDay = (instant: Date) => new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(instant);
    for (const meeting of meetings) {
      const day = shopDay(meeting.starts_at);
      const closed = closures.some((c) => c.starts_on <= day && day <= c.ends_on);
      expect([day, meeting.status, meeting.cancelled_at !== null]).toEqual([day, closed ? 'cancelled' : 'active', closed]);
    }
  });
});
