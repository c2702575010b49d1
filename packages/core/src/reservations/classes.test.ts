import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import { CLASS_MAX_WEEKS, classCreateSchema, classRrule, wallClockInstant, weeklyOccurrences } from './classes';

const CHICAGO = 'America/Chicago';

/** Wall-clock time in Chicago as the IANA tz database through Intl gives it: 'YYYY-MM-DD HH:MM, weekday'. */
function chicagoClock(instant: Date): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone: CHICAGO,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    weekday: 'short',
    hourCycle: 'h23',
  }).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value;
  return `${part('year')}-${part('month')}-${part('day')} ${part('hour')}:${part('minute')}, ${part('weekday')}`;
}

/*
 * RFC 5545 §3.6.5: a VTIMEZONE for Chicago. The rules are the United States' since 2007 (second
 * Sunday of March, first Sunday of November, at 2:00 local), written from memory of that law; the
 * test checks them against Intl below, so a wrong rule would fail rather than pass unseen.
 */
const CHICAGO_VTIMEZONE = [
  'BEGIN:VTIMEZONE',
  'TZID:America/Chicago',
  'BEGIN:DAYLIGHT',
  'DTSTART:20070311T020000',
  'RRULE:FREQ=YEARLY;BYMONTH=3;BYDAY=2SU',
  'TZOFFSETFROM:-0600',
  'TZOFFSETTO:-0500',
  'TZNAME:CDT',
  'END:DAYLIGHT',
  'BEGIN:STANDARD',
  'DTSTART:20071104T020000',
  'RRULE:FREQ=YEARLY;BYMONTH=11;BYDAY=1SU',
  'TZOFFSETFROM:-0500',
  'TZOFFSETTO:-0600',
  'TZNAME:CST',
  'END:STANDARD',
  'END:VTIMEZONE',
].join('\r\n');

/** The starts an independent RRULE reader (ical.js) expands from DTSTART in the shop's zone, as UTC instants. */
function icalStarts(localStart: string, rrule: string): Date[] {
  const text = ['BEGIN:VCALENDAR', 'VERSION:2.0', 'PRODID:-//Chuckkey//classes test//EN', CHICAGO_VTIMEZONE, 'BEGIN:VEVENT', 'UID:class-test@example.org', 'DTSTAMP:20261201T000000Z', `DTSTART;TZID=America/Chicago:${localStart}`, `RRULE:${rrule}`, 'END:VEVENT', 'END:VCALENDAR', ''].join('\r\n');
  const calendar = new ICAL.Component(ICAL.parse(text));
  const timezone = calendar.getFirstSubcomponent('vtimezone')!;
  ICAL.TimezoneService.register(timezone);
  const event = new ICAL.Event(calendar.getFirstSubcomponent('vevent')!);
  const iterator = event.iterator();
  const starts: Date[] = [];
  for (let next = iterator.next(); next; next = iterator.next()) starts.push(next.toJSDate());
  return starts;
}

describe('weeklyOccurrences()', () => {
  it('a Saturday 9:00 class over the November change stays at 9:00 local, its UTC instant moving an hour', () => {
    // IANA tz database via Intl: Saturday 24 October 2026 9:00 CDT (UTC−5) is 14:00Z; the clocks go back on Sunday 1 November.
    const first = { start: new Date('2026-10-24T14:00:00Z'), end: new Date('2026-10-24T16:00:00Z') };

    const occurrences = weeklyOccurrences(first, 3, CHICAGO);

    expect(occurrences.map((o) => chicagoClock(o.start))).toEqual(['2026-10-24 09:00, Sat', '2026-10-31 09:00, Sat', '2026-11-07 09:00, Sat']);
    expect(occurrences.map((o) => chicagoClock(o.end))).toEqual(['2026-10-24 11:00, Sat', '2026-10-31 11:00, Sat', '2026-11-07 11:00, Sat']);
    // IANA tz database via Intl: 7 November 2026 is CST (UTC−6), so 9:00 local is 15:00Z.
    expect(occurrences[2]!.start.toISOString()).toBe('2026-11-07T15:00:00.000Z');
  });

  it('a class over the March change keeps its wall-clock times too', () => {
    // IANA tz database via Intl: Thursday 5 March 2027 18:30 CST (UTC−6) is 00:30Z on the 6th; the clocks go forward on Sunday 14 March.
    const first = { start: new Date('2027-03-05T00:30:00Z'), end: new Date('2027-03-05T02:30:00Z') };

    const occurrences = weeklyOccurrences(first, 3, CHICAGO);

    expect(occurrences.map((o) => chicagoClock(o.start))).toEqual(['2027-03-04 18:30, Thu', '2027-03-11 18:30, Thu', '2027-03-18 18:30, Thu']);
    expect(occurrences[2]!.start.toISOString()).toBe('2027-03-18T23:30:00.000Z');
  });

  it('meets once when it does not repeat', () => {
    const first = { start: new Date('2026-12-12T15:00:00Z'), end: new Date('2026-12-12T18:00:00Z') };
    expect(weeklyOccurrences(first, 1, CHICAGO)).toEqual([first]);
  });
});

describe('classRrule()', () => {
  it('an independent RRULE reader expands it in the shop zone to the same meetings (RFC 5545 §3.3.10, §3.8.5.3)', () => {
    const first = { start: new Date('2026-10-17T14:00:00Z'), end: new Date('2026-10-17T16:00:00Z') };
    const rrule = classRrule(6)!;

    // RFC 5545 §3.3.10: FREQ=WEEKLY with COUNT bounds the set to that many occurrences, DTSTART the first.
    expect(rrule).toBe('FREQ=WEEKLY;COUNT=6');
    const ours = weeklyOccurrences(first, 6, CHICAGO).map((o) => o.start.toISOString());
    const theirs = icalStarts('20261017T090000', rrule).map((d) => d.toISOString());

    expect(theirs).toEqual(ours);
    expect(theirs).toHaveLength(6);
  });

  it('is none for a class that meets once', () => {
    expect(classRrule(1)).toBeNull();
  });
});

describe('classCreateSchema', () => {
  const valid = { machineId: '3f1e2d4c-5b6a-4798-8a0b-1c2d3e4f5a6b', title: ' Lathe fundamentals class ', start: '2026-12-12T09:00:00-06:00', end: '2026-12-12T12:00:00-06:00' };

  it('trims the title and fills in one week, no training, no capacity and no members', () => {
    expect(classCreateSchema.parse(valid)).toEqual({
      ...valid,
      title: 'Lathe fundamentals class',
      start: new Date('2026-12-12T15:00:00Z'),
      end: new Date('2026-12-12T18:00:00Z'),
      trainingId: null,
      weeks: 1,
      capacity: null,
      memberIds: [],
    });
  });

  it('refuses an end before the start, more weeks than the limit and more members than the capacity', () => {
    const refused = classCreateSchema.safeParse({
      ...valid,
      end: '2026-12-12T08:00:00-06:00',
      weeks: CLASS_MAX_WEEKS + 1,
      capacity: 1,
      memberIds: ['4a1e2d4c-5b6a-4798-8a0b-1c2d3e4f5a6b', '5b1e2d4c-5b6a-4798-8a0b-1c2d3e4f5a6b'],
    });
    expect(refused.success).toBe(false);
    expect(refused.error?.issues.map((i) => i.path.join('.')).sort()).toEqual(['end', 'memberIds', 'weeks']);
  });
});

describe('wallClockInstant()', () => {
  it('reads a date and wall-clock time in the shop zone on either side of the November change', () => {
    // IANA tz database via Intl: 31 October 2026 is CDT (UTC−5), 7 November 2026 CST (UTC−6).
    expect(wallClockInstant('2026-10-31', '09:00', CHICAGO).toISOString()).toBe('2026-10-31T14:00:00.000Z');
    expect(wallClockInstant('2026-11-07', '09:00', CHICAGO).toISOString()).toBe('2026-11-07T15:00:00.000Z');
    expect(chicagoClock(wallClockInstant('2026-11-07', '09:00', CHICAGO))).toBe('2026-11-07 09:00, Sat');
  });
});
