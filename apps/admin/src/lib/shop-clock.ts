import { wallClockAt } from '@chuckkey/core';

/**
 * The shop's wall clock in words. Calendar arithmetic and turning wall-clock times into instants
 * live in core (shop/calendar.ts), shared with the server.
 */

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
  return `${day}, ${clockLabel(wallClockAt(start, timeZone).minutes)}`;
}

/** "Saturday 7 March, 9:00–11:00" on the shop's wall clock. */
export function spanLabel(start: Date, end: Date, timeZone: string): string {
  return `${startLabel(start, timeZone)}–${clockLabel(wallClockAt(end, timeZone).minutes)}`;
}

/** "Monday 2 March" for a date of the shop's calendar; formatted in UTC, where a bare date cannot shift. */
export function calendarDateLabel(date: string, style: 'long' | 'short' = 'long'): string {
  const options: Intl.DateTimeFormatOptions =
    style === 'long' ? { timeZone: 'UTC', weekday: 'long', day: 'numeric', month: 'long' } : { timeZone: 'UTC', day: 'numeric', month: 'short' };
  return new Intl.DateTimeFormat('en-GB', options).format(new Date(`${date}T00:00:00Z`)).replace(',', '');
}
