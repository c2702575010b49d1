import { classRrule, hoursOnDate, shopDate, wallClockInstant, weeklyOccurrences } from '@chuckkey/core';
import type { Knex } from 'knex';
import { demoClosures } from './08_shop_hours';

const DAY = 86_400_000;

/** The demo shop's weekly sign-off class: Saturday mornings on the big lathe, from the coming Saturday. */
export const demoClass = {
  title: 'Lathe fundamentals class',
  machineName: 'Lathe 1 · 13×40',
  trainingName: 'Metal lathe fundamentals',
  instructorEmail: 'instructor@example.org',
  memberEmails: ['member@example.org'],
  isoWeekday: 6,
  startsAt: '09:00',
  endsAt: '12:00',
  weeks: 6,
  capacity: 4,
} as const;

/** The first date after `today` ('YYYY-MM-DD') that falls on the ISO weekday (Monday 1 … Sunday 7). */
function nextWeekday(today: string, isoWeekday: number): string {
  const date = new Date(`${today}T00:00:00Z`);
  do date.setTime(date.getTime() + DAY);
  while (((date.getUTCDay() + 6) % 7) + 1 !== isoWeekday);
  return date.toISOString().slice(0, 10);
}

/**
 * Dates count from today in the shop's time zone, so the class is always still to come. A meeting
 * that falls on a closure is in the calendar as cancelled: the instructor called it off.
 */
export async function seed(knex: Knex): Promise<void> {
  const shop = await knex('shop').first<{ time_zone: string }>('time_zone').where({ id: 1 });
  const machine = await knex('machines').first<{ id: string; buffer_minutes: number }>('id', 'buffer_minutes').where({ name: demoClass.machineName });
  const training = await knex('trainings').first<{ id: string }>('id').where({ name: demoClass.trainingName });
  const instructor = await knex('members').first<{ id: string }>('id').where({ email: demoClass.instructorEmail });
  if (!shop || !machine || !instructor) throw new Error('the demo class needs the demo shop, its big lathe and its instructor');
  const timeZone = shop.time_zone;

  const date = nextWeekday(shopDate(new Date(), timeZone), demoClass.isoWeekday);
  const first = { start: wallClockInstant(date, demoClass.startsAt, timeZone), end: wallClockInstant(date, demoClass.endsAt, timeZone) };
  const [inserted] = await knex('classes')
    .insert({
      title: demoClass.title,
      machine_id: machine.id,
      training_id: training?.id ?? null,
      instructor_id: instructor.id,
      starts_at: first.start,
      ends_at: first.end,
      weeks: demoClass.weeks,
      rrule: classRrule(demoClass.weeks),
      capacity: demoClass.capacity,
    })
    .returning<{ id: string }[]>('id');
  if (!inserted) throw new Error('the demo class was not stored');

  const closures = demoClosures.map((c) => ({ startsOn: c.startsOn, endsOn: c.endsOn, reason: c.reason }));
  const now = new Date();
  await knex('reservations').insert(
    weeklyOccurrences(first, demoClass.weeks, timeZone).map((meeting) => {
      const closed = hoursOnDate([], closures, timeZone, meeting.start).closure !== null;
      return {
        class_id: inserted.id,
        kind: 'class',
        machine_id: machine.id,
        member_id: instructor.id,
        starts_at: meeting.start,
        ends_at: meeting.end,
        blocked_until: new Date(meeting.end.getTime() + machine.buffer_minutes * 60_000),
        status: closed ? 'cancelled' : 'active',
        cancelled_at: closed ? now : null,
      };
    }),
  );

  const members: { id: string }[] = await knex('members').whereIn('email', demoClass.memberEmails).select('id');
  if (members.length > 0) {
    await knex('class_members').insert(members.map((member) => ({ class_id: inserted.id, member_id: member.id, added_by: instructor.id })));
  }
}
