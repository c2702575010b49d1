/**
 * Dates of the shop's calendar ('YYYY-MM-DD') and the shop's wall clock, for the server and the
 * web app alike. Calendar arithmetic needs no time zone; turning a wall-clock time into an instant
 * and back goes through Intl, which reads the IANA time zone database.
 */

const DAY_MS = 86_400_000;

export interface CalendarDate {
  year: number;
  month: number;
  day: number;
}

export function parseCalendarDate(date: string): CalendarDate {
  const [year, month, day] = date.split('-').map(Number);
  return { year: year ?? 0, month: month ?? 1, day: day ?? 1 };
}

export function calendarDateIso({ year, month, day }: CalendarDate): string {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** The calendar date `days` after `date`; plain calendar arithmetic, no time zone involved. */
export function shiftCalendarDate(date: CalendarDate, days: number): CalendarDate {
  const moved = new Date(Date.UTC(date.year, date.month - 1, date.day + days));
  return { year: moved.getUTCFullYear(), month: moved.getUTCMonth() + 1, day: moved.getUTCDate() };
}

/** `addCalendarDays('2026-02-27', 2)` is '2026-03-01'. */
export function addCalendarDays(date: string, days: number): string {
  return calendarDateIso(shiftCalendarDate(parseCalendarDate(date), days));
}

const partsFormats = new Map<string, Intl.DateTimeFormat>();

/** What the shop's wall clock reads at an instant: its calendar date and minutes after midnight. */
export function wallClockAt(instant: Date | number, timeZone: string): { date: string; minutes: number } {
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
  const part: Partial<Record<Intl.DateTimeFormatPartTypes, number>> = {};
  for (const { type, value } of format.formatToParts(instant)) part[type] = Number(value);
  const date = calendarDateIso({ year: part.year ?? 0, month: part.month ?? 1, day: part.day ?? 1 });
  return { date, minutes: (part.hour ?? 0) * 60 + (part.minute ?? 0) };
}

/**
 * The instant at which the shop's wall clock reads `minutes` after midnight on `date` (1440 is the
 * midnight that ends it), or null for a time the clocks skip (2:30 on the night they go forward).
 * In the hour that repeats when they go back, the first of the two is meant.
 */
export function wallTimeToInstant(date: string, minutes: number, timeZone: string): Date | null {
  const { year, month, day } = parseCalendarDate(date);
  const target = Date.UTC(year, month - 1, day, 0, minutes);
  const offsetAt = (instant: number) => {
    const wall = wallClockAt(instant, timeZone);
    const { year: y, month: m, day: d } = parseCalendarDate(wall.date);
    return Date.UTC(y, m - 1, d, 0, wall.minutes) - instant;
  };
  const want = minutes === 1440 ? { date: addCalendarDays(date, 1), minutes: 0 } : { date, minutes };
  // The offsets in force a day either side cover both sides of a change, so a repeated hour
  // yields two matches (the earlier is kept) and a skipped one none.
  const matches = [target - DAY_MS, target, target + DAY_MS]
    .map((probe) => target - offsetAt(probe))
    .filter((instant) => {
      const wall = wallClockAt(instant, timeZone);
      return wall.date === want.date && wall.minutes === want.minutes;
    });
  return matches.length === 0 ? null : new Date(Math.min(...matches));
}
