/**
 * The shop's wall clock: calendar dates and clock times in the shop's time zone, turned into
 * instants and back through Intl, which reads the IANA time zone database.
 */

const DAY_MS = 86_400_000;

export interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

export function parseDate(date: string): CalendarDate {
  const [year = 0, month = 1, day = 1] = date.split('-').map(Number);
  return { year, month, day };
}

/** The calendar date `days` after `date`, 'YYYY-MM-DD'; calendar arithmetic, no time zone involved. */
export function addDays(date: string, days: number): string {
  const { year, month, day } = parseDate(date);
  return new Date(Date.UTC(year, month - 1, day + days)).toISOString().slice(0, 10);
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
  const parts = format.formatToParts(instant);
  const part = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value);
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
