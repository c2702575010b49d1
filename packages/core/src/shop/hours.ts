import { TZDate } from '@date-fns/tz';
import type { Weekday } from './hours-schemas';
import { calendarDateIso, parseCalendarDate, shiftCalendarDate, type CalendarDate } from './calendar';
import { clockMinutes, clockTime, MINUTES_PER_DAY, weekdayNames, weekdays } from './hours-schemas';

export * from './hours-schemas';

/** A row of the weekly schedule as stored: wall-clock times 'HH:MM' in the shop's time zone. */
export interface WeeklyHours {
  weekday: number;
  opensAt: string;
  closesAt: string;
}

/** Whole calendar days in the shop's calendar, 'YYYY-MM-DD', both ends included. */
export interface ClosureDays {
  startsOn: string;
  endsOn: string;
  reason: string;
}

/** Whether the shop is open at an instant: exactly what clearance rule 7 needs. */
export interface ShopHoursNow {
  open: boolean;
  /** When closed, the next opening within OPENING_LOOKAHEAD_DAYS (closures skipped); null when open or none is that near. */
  opensAt: Date | null;
  /** When open, the end of this opening (null if the shop stays open past the days looked at); when closed, the last closing if it was today. */
  closesAt: Date | null;
  /** The closure that covers today, if one does. */
  closure: { reason: string } | null;
}

export interface DayHours {
  date: string;
  weekday: Weekday;
  closure: { reason: string } | null;
  /** Earliest first, touching intervals joined; empty when the shop is closed all day. */
  intervals: { opensAt: string; closesAt: string }[];
}

/** How far ahead a closed shop looks for its next opening, for "come back …". */
export const OPENING_LOOKAHEAD_DAYS = 14;

const DAY_MS = 86_400_000;
const ALL_DAY: readonly Span[] = [[0, MINUTES_PER_DAY]];

/** Minutes on the shop's wall clock: [opens, closes). */
type Span = readonly [number, number];

/** ISO 8601 weekday of a calendar date: Monday 1 … Sunday 7. */
function isoWeekday({ year, month, day }: CalendarDate): Weekday {
  return (((new Date(Date.UTC(year, month - 1, day)).getUTCDay() + 6) % 7) + 1) as Weekday;
}

/** The shop's calendar date at an instant, 'YYYY-MM-DD'. */
export function shopDate(instant: Date, timeZone: string): string {
  const local = new TZDate(instant.getTime(), timeZone);
  return calendarDateIso({ year: local.getFullYear(), month: local.getMonth() + 1, day: local.getDate() });
}

/**
 * Each weekday's openings as sorted, joined spans of minutes. With no rows at all no hours are
 * set, and every day is open around the clock: a new shop is not locked out by a missing setting.
 */
function spansByWeekday(schedule: readonly WeeklyHours[]): Map<number, Span[]> {
  const byDay = new Map<number, Span[]>();
  for (const row of schedule) {
    const opens = clockMinutes(row.opensAt);
    const closes = clockMinutes(row.closesAt);
    if (opens === null || closes === null || closes <= opens) continue;
    byDay.set(row.weekday, [...(byDay.get(row.weekday) ?? []), [opens, closes]]);
  }
  for (const [weekday, spans] of byDay) byDay.set(weekday, joined(spans.sort((a, b) => a[0] - b[0])));
  return byDay;
}

/** Joins sorted spans that touch or overlap, so 12:00–14:00 and 14:00–18:00 read as one opening. */
function joined(spans: readonly Span[]): Span[] {
  const out: [number, number][] = [];
  for (const [opens, closes] of spans) {
    const last = out[out.length - 1];
    if (last && opens <= last[1]) last[1] = Math.max(last[1], closes);
    else out.push([opens, closes]);
  }
  return out;
}

function closureOn(closures: readonly ClosureDays[], date: string): { reason: string } | null {
  let found: ClosureDays | null = null;
  for (const closure of closures) {
    if (closure.startsOn <= date && date <= closure.endsOn && (!found || closure.startsOn < found.startsOn)) found = closure;
  }
  return found ? { reason: found.reason } : null;
}

function spansOn(byWeekday: Map<number, Span[]>, noHoursSet: boolean, date: CalendarDate): readonly Span[] {
  return noHoursSet ? ALL_DAY : (byWeekday.get(isoWeekday(date)) ?? []);
}

/**
 * The shop's openings on one calendar day, for "today's hours". `date` is a date of the shop's
 * calendar ('YYYY-MM-DD'), or an instant whose date in the shop's time zone is meant.
 */
export function hoursOnDate(schedule: readonly WeeklyHours[], closures: readonly ClosureDays[], timeZone: string, date: Date | string): DayHours {
  const day = typeof date === 'string' ? date : shopDate(date, timeZone);
  const calendar = parseCalendarDate(day);
  const closure = closureOn(closures, day);
  const spans = closure ? [] : spansOn(spansByWeekday(schedule), schedule.length === 0, calendar);
  return {
    date: day,
    weekday: isoWeekday(calendar),
    closure,
    intervals: spans.map(([opens, closes]) => ({ opensAt: clockTime(opens), closesAt: clockTime(closes) })),
  };
}

/**
 * Instants of wall-clock times in a time zone, as TZDate works them out. The same few (today's
 * opening and closing times) are asked for on every scan, and a time zone's rules do not change
 * while the process runs, so each is worked out once; the cache is emptied when it grows large.
 */
const wallClockInstants = new Map<string, number>();
const WALL_CLOCK_CACHE_SIZE = 1_000;
function wallClockInstant(timeZone: string, date: CalendarDate, hour: number, minute: number): Date {
  const key = `${timeZone} ${date.year}-${date.month}-${date.day} ${hour}:${minute}`;
  let time = wallClockInstants.get(key);
  if (time === undefined) {
    time = new TZDate(date.year, date.month - 1, date.day, hour, minute, 0, 0, timeZone).getTime();
    if (wallClockInstants.size >= WALL_CLOCK_CACHE_SIZE) wallClockInstants.clear();
    wallClockInstants.set(key, time);
  }
  return new Date(time);
}

const openAllTheTime: ShopHoursNow = { open: true, opensAt: null, closesAt: null, closure: null };

/**
 * Whether the shop is open at `now` by its weekly hours and closures, in its time zone.
 *
 * The work is done on the shop's wall clock, in minutes from the start of today, so an opening of
 * 09:00–17:00 stays 09:00–17:00 local on the days clocks change; only the answer's instants are
 * converted, once each. Openings that run into each other across midnight (Friday until 24:00,
 * Saturday from 00:00) count as one. This runs on every scan: a shop with no hours and no
 * closures costs nothing, and one with hours a handful of time-zone conversions.
 */
export function shopHoursAt(schedule: readonly WeeklyHours[], closures: readonly ClosureDays[], timeZone: string, now: Date): ShopHoursNow {
  if (schedule.length === 0 && closures.length === 0) return openAllTheTime;

  const local = new TZDate(now.getTime(), timeZone);
  const today: CalendarDate = { year: local.getFullYear(), month: local.getMonth() + 1, day: local.getDate() };
  const minute = local.getHours() * 60 + local.getMinutes() + local.getSeconds() / 60 + local.getMilliseconds() / 60_000;
  const byWeekday = spansByWeekday(schedule);

  // From today's midnight on: an opening that ran past midnight is stored as today's 00:00 row,
  // and a closing at yesterday's 24:00 is yesterday's, not today's.
  const lastDay = OPENING_LOOKAHEAD_DAYS + 1;
  const timeline: Span[] = [];
  for (let offset = 0; offset <= lastDay; offset += 1) {
    const date = shiftCalendarDate(today, offset);
    if (closures.length > 0 && closureOn(closures, calendarDateIso(date))) continue;
    for (const [opens, closes] of spansOn(byWeekday, schedule.length === 0, date)) {
      timeline.push([offset * MINUTES_PER_DAY + opens, offset * MINUTES_PER_DAY + closes]);
    }
  }
  const openings = joined(timeline);
  const horizon = (lastDay + 1) * MINUTES_PER_DAY;

  const instant = (minutes: number): Date => {
    const date = shiftCalendarDate(today, Math.floor(minutes / MINUTES_PER_DAY));
    const within = minutes - Math.floor(minutes / MINUTES_PER_DAY) * MINUTES_PER_DAY;
    return wallClockInstant(timeZone, date, Math.floor(within / 60), within % 60);
  };

  const closure = closures.length > 0 ? closureOn(closures, calendarDateIso(today)) : null;
  const current = openings.find(([opens, closes]) => opens <= minute && minute < closes);
  if (current) return { open: true, opensAt: null, closesAt: current[1] >= horizon ? null : instant(current[1]), closure };

  const next = openings.find(([opens]) => opens > minute);
  const opensAt = next ? instant(next[0]) : null;
  const last = openings.filter(([, closes]) => closes <= minute).at(-1);
  return {
    open: false,
    opensAt: opensAt && opensAt.getTime() - now.getTime() <= OPENING_LOOKAHEAD_DAYS * DAY_MS ? opensAt : null,
    closesAt: last ? instant(last[1]) : null,
    closure,
  };
}

/**
 * The weekly schedule in words, Monday first: "Monday closed; Tuesday 16:00–22:00; …", or
 * "No hours set (open at all times)". For the audit log, where a before-and-after must read plainly.
 */
export function describeWeeklyHours(schedule: readonly WeeklyHours[]): string {
  if (schedule.length === 0) return 'No hours set (open at all times)';
  const byWeekday = spansByWeekday(schedule);
  return weekdays
    .map((weekday) => {
      const spans = byWeekday.get(weekday) ?? [];
      const times = spans.map(([opens, closes]) => `${clockTime(opens)}–${clockTime(closes)}`).join(', ');
      return `${weekdayNames[weekday]} ${times || 'closed'}`;
    })
    .join('; ');
}
