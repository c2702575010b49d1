import { hoursOnDate, shopDate, weekdayNames, type ClosureDays, type MyReservation, type TakenRange, type Weekday, type WeeklyHours } from '@chuckkey/core';

const MINUTE = 60_000;
const DAY_MS = 86_400_000;

/** Without opening hours set, a day is shown on the design's day rail, 6:00 to midnight. */
const RAIL_OPENS = 6 * 60;
const RAIL_CLOSES = 24 * 60;

export type SlotState = 'free' | 'taken' | 'class' | 'past';

export interface Slot {
  start: Date;
  end: Date;
  /** The wall-clock time in the shop, "9:00". */
  time: string;
  state: SlotState;
  /** What a screen reader says for the slot's button: "Saturday 9:00, free". */
  label: string;
}

export interface WeekDay {
  date: string;
  weekday: Weekday;
  name: string;
  closure: string | null;
  slots: Slot[];
}

interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

function parseDate(date: string): CalendarDate {
  const [year = 0, month = 1, day = 1] = date.split('-').map(Number);
  return { year, month, day };
}

/** The calendar date `days` after `date`, 'YYYY-MM-DD'; calendar arithmetic, no time zone involved. */
export function addDays(date: string, days: number): string {
  const { year, month, day } = parseDate(date);
  return new Date(Date.UTC(year, month - 1, day + days)).toISOString().slice(0, 10);
}

function isoWeekday(date: string): Weekday {
  const { year, month, day } = parseDate(date);
  return (((new Date(Date.UTC(year, month - 1, day)).getUTCDay() + 6) % 7) + 1) as Weekday;
}

/** The Monday of the shop's week that holds `instant`, 'YYYY-MM-DD'. */
export function mondayOf(instant: Date, timeZone: string): string {
  const date = shopDate(instant, timeZone);
  return addDays(date, 1 - isoWeekday(date));
}

const partsFormats = new Map<string, Intl.DateTimeFormat>();

function wallClock(instant: number, timeZone: string): { date: string; minutes: number } {
  let format = partsFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    });
    partsFormats.set(timeZone, format);
  }
  const part = (type: string) => Number(format.formatToParts(instant).find((p) => p.type === type)?.value);
  const date = new Date(Date.UTC(part('year'), part('month') - 1, part('day'))).toISOString().slice(0, 10);
  return { date, minutes: part('hour') * 60 + part('minute') };
}

/**
 * The instant at which the shop's wall clock reads `minutes` after midnight on `date`, or null
 * for a time the clocks skip (2:30 on the night they go forward). In the hour that repeats when
 * they go back, the first of the two is meant.
 */
export function wallTimeToInstant(date: string, minutes: number, timeZone: string): Date | null {
  const { year, month, day } = parseDate(date);
  const target = Date.UTC(year, month - 1, day, 0, minutes);
  const offsetAt = (instant: number) => {
    const wall = wallClock(instant, timeZone);
    const { year: y, month: m, day: d } = parseDate(wall.date);
    return Date.UTC(y, m - 1, d, 0, wall.minutes) - instant;
  };
  // The offsets in force a day either side cover both sides of a change, so a repeated hour
  // yields two matches (the earlier is kept) and a skipped one none.
  const candidates = [target - DAY_MS, target, target + DAY_MS].map((probe) => target - offsetAt(probe));
  const matches = candidates.filter((instant) => {
    const wall = wallClock(instant, timeZone);
    const want = minutes === 1440 ? { date: addDays(date, 1), minutes: 0 } : { date, minutes };
    return wall.date === want.date && wall.minutes === want.minutes;
  });
  if (matches.length === 0) return null;
  return new Date(Math.min(...matches));
}

/** "9:00", "14:30": the shop's wall clock, 24-hour, as the rest of the app writes times. */
export function clockLabel(minutes: number): string {
  return `${Math.floor(minutes / 60)}:${String(minutes % 60).padStart(2, '0')}`;
}

const stateWords: Record<SlotState, string> = { free: 'free', taken: 'taken', class: 'held for a class', past: 'past' };

export interface WeekInput {
  monday: string;
  timeZone: string;
  slotMinutes: number;
  weekly: readonly WeeklyHours[];
  closures: readonly ClosureDays[];
  taken: readonly TakenRange[];
  now: Date;
}

/**
 * The week's days Monday to Sunday, each with its slots on the shop's wall clock inside the
 * opening hours. A slot is taken while any claim or the cleanup buffer after it overlaps it.
 */
export function weekSlots({ monday, timeZone, slotMinutes, weekly, closures, taken, now }: WeekInput): WeekDay[] {
  const claims = taken.map((range) => ({ start: Date.parse(range.start), until: Date.parse(range.blockedUntil), kind: range.kind }));
  return Array.from({ length: 7 }, (_, index) => {
    const date = addDays(monday, index);
    const hours = hoursOnDate(weekly, closures, timeZone, date);
    const name = weekdayNames[hours.weekday];
    const spans: [number, number][] =
      weekly.length === 0 && !hours.closure
        ? [[RAIL_OPENS, RAIL_CLOSES]]
        : hours.intervals.map((i) => [clockMinutesOf(i.opensAt), clockMinutesOf(i.closesAt)]);
    const slots: Slot[] = [];
    for (const [opens, closes] of spans) {
      const first = Math.ceil(opens / slotMinutes) * slotMinutes;
      for (let minutes = first; minutes + slotMinutes <= closes; minutes += slotMinutes) {
        const start = wallTimeToInstant(date, minutes, timeZone);
        if (!start) continue;
        // A slot lasts its step in real time: 1:00 on the night the clocks go forward ends at 3:00.
        const end = new Date(start.getTime() + slotMinutes * MINUTE);
        const claim = claims.find((c) => c.start < end.getTime() && start.getTime() < c.until);
        const state: SlotState = start.getTime() < now.getTime() ? 'past' : claim ? (claim.kind === 'class' ? 'class' : 'taken') : 'free';
        const time = clockLabel(minutes);
        slots.push({ start, end, time, state, label: `${name} ${time}, ${stateWords[state]}` });
      }
    }
    return { date, weekday: hours.weekday, name, closure: hours.closure?.reason ?? null, slots };
  });
}

function clockMinutesOf(time: string): number {
  const [hours = 0, minutes = 0] = time.split(':').map(Number);
  return hours * 60 + minutes;
}

/**
 * Minutes of the weekly quota still free in the Monday-to-Sunday week starting `monday`: the
 * member's live claims on the machine that fall in that week count against it.
 */
export function quotaLeft(mine: readonly MyReservation[], machineId: string, monday: string, timeZone: string, quotaMinutes: number): number {
  const weekStart = wallTimeToInstant(monday, 0, timeZone)?.getTime() ?? Number.NaN;
  const weekEnd = wallTimeToInstant(addDays(monday, 7), 0, timeZone)?.getTime() ?? Number.NaN;
  const booked = mine
    .filter((r) => r.machineId === machineId && (r.status === 'active' || r.status === 'checked_in'))
    .reduce((sum, r) => sum + Math.max(0, Math.min(Date.parse(r.end), weekEnd) - Math.max(Date.parse(r.start), weekStart)) / MINUTE, 0);
  return Math.max(0, quotaMinutes - booked);
}

/** "2 h", "1 h 30 min", "45 min": the way the shop's rules speak of lengths. */
export function durationLabel(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

/** "Saturday 7 March, 9:00" on the shop's wall clock. */
export function startLabel(start: Date, timeZone: string): string {
  const day = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long', day: 'numeric', month: 'long' }).format(start).replace(',', '');
  return `${day}, ${clockLabel(wallClock(start.getTime(), timeZone).minutes)}`;
}

/** "Saturday 7 March, 9:00–11:00" on the shop's wall clock. */
export function spanLabel(start: Date, end: Date, timeZone: string): string {
  return `${startLabel(start, timeZone)}–${clockLabel(wallClock(end.getTime(), timeZone).minutes)}`;
}

/** "Monday 2 March" for a date of the shop's calendar; formatted in UTC, where a bare date cannot shift. */
export function calendarDateLabel(date: string, style: 'long' | 'short' = 'long'): string {
  const options: Intl.DateTimeFormatOptions =
    style === 'long' ? { timeZone: 'UTC', weekday: 'long', day: 'numeric', month: 'long' } : { timeZone: 'UTC', day: 'numeric', month: 'short' };
  return new Intl.DateTimeFormat('en-GB', options).format(new Date(`${date}T00:00:00Z`)).replace(',', '');
}
