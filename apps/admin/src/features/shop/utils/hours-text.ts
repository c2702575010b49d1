import { MINUTES_PER_DAY, type ShopClosure, type ShopHours } from '@chuckkey/core';

/**
 * Words for the shop's hours. Wall-clock times are shown as the shop set them (24:00 stays 24:00),
 * instants in the shop's time zone, and calendar dates as the dates they are, whatever the
 * browser's own zone. `locale` is the browser's unless a caller (a test) names one.
 */

const DAY_MS = MINUTES_PER_DAY * 60_000;

/** A calendar date 'YYYY-MM-DD' as midnight UTC, to be formatted in UTC so that it never shifts a day. */
function calendarInstant(date: string): Date {
  const [year, month, day] = date.split('-').map(Number);
  return new Date(Date.UTC(year ?? 1970, (month ?? 1) - 1, day ?? 1));
}

const calendarFormat = (locale: string | undefined) =>
  new Intl.DateTimeFormat(locale, { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });

/** "Thu, 24 Dec 2026", or "Thu, 24 Dec – Sat, 26 Dec 2026" for several days (in British English). */
export function closureDays(closure: Pick<ShopClosure, 'startsOn' | 'endsOn'>, locale?: string): string {
  const format = calendarFormat(locale);
  if (closure.startsOn === closure.endsOn) return format.format(calendarInstant(closure.startsOn));
  return format.formatRange(calendarInstant(closure.startsOn), calendarInstant(closure.endsOn));
}

/** "16:00–22:00, 09:00–12:00", or the given words for a day with none. */
export function intervalsText(intervals: readonly { opensAt: string; closesAt: string }[], none: string): string {
  return intervals.length === 0 ? none : intervals.map((i) => `${i.opensAt}–${i.closesAt}`).join(', ');
}

/** The shop's calendar date of an instant, 'YYYY-MM-DD'. */
function shopDateOf(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en', { year: 'numeric', month: '2-digit', day: '2-digit', timeZone }).formatToParts(instant);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

/** "16:00 today", "Saturday 09:00" within the week, "Saturday 14 March, 09:00" further ahead. */
export function shopMoment(iso: string, timeZone: string, today: string, locale?: string): string {
  const instant = new Date(iso);
  const clock = new Intl.DateTimeFormat(locale, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(instant);
  const days = Math.round((calendarInstant(shopDateOf(instant, timeZone)).getTime() - calendarInstant(today).getTime()) / DAY_MS);
  if (days === 0) return `${clock} today`;
  const weekday = new Intl.DateTimeFormat(locale, { weekday: 'long', timeZone }).format(instant);
  if (days > 0 && days < 7) return `${weekday} ${clock}`;
  const date = new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'long', timeZone }).format(instant);
  return `${weekday} ${date}, ${clock}`;
}

export interface TodayText {
  /** "Open now", "Closed now", "Closed today: Winter deep clean". */
  state: string;
  /** When that changes: "Until 22:00 today.", "Opens Saturday 09:00." */
  change: string;
  /** The day's hours: "16:00–22:00" or "Closed all day". */
  hours: string;
}

/** Today at a glance, as the page header says it. */
export function todayText(hours: Pick<ShopHours, 'timeZone' | 'weekly' | 'today'>, locale?: string): TodayText {
  const { today, timeZone } = hours;
  if (hours.weekly.length === 0 && today.open) {
    return { state: 'Open at all times', change: 'No opening hours are set.', hours: intervalsText(today.intervals, 'Closed all day') };
  }
  const state = today.closure ? `Closed today: ${today.closure.reason}` : today.open ? 'Open now' : 'Closed now';
  const change = today.open
    ? today.closesAt
      ? `Until ${shopMoment(today.closesAt, timeZone, today.date, locale)}.`
      : 'No closing time in the next two weeks.'
    : today.opensAt
      ? `Opens ${shopMoment(today.opensAt, timeZone, today.date, locale)}.`
      : 'No opening in the next two weeks.';
  return { state, change, hours: intervalsText(today.intervals, 'Closed all day') };
}
