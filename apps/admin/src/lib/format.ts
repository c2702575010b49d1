/**
 * Times are stored in UTC and shown in the shop's time zone; until the shop's details have
 * loaded the browser's own zone is the closest guess.
 */
export function formatDate(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone }).format(date);
}

export function formatDateTime(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short', timeZone }).format(date);
}

export function formatHours(hours: number): string {
  return `${new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 }).format(hours)} h`;
}

const dayKeys = new Map<string, Intl.DateTimeFormat>();

function dayKey(date: Date, timeZone?: string): string {
  const key = timeZone ?? '';
  let format = dayKeys.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-CA', { year: 'numeric', month: '2-digit', day: '2-digit', timeZone });
    dayKeys.set(key, format);
  }
  return format.format(date);
}

/** The time alone for an instant of today (in the shop's zone), the date and time otherwise. */
export function formatTimeOrDateTime(iso: string, timeZone?: string, now: Date = new Date()): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  if (dayKey(date, timeZone) !== dayKey(now, timeZone)) return formatDateTime(iso, timeZone);
  return new Intl.DateTimeFormat(undefined, { timeStyle: 'short', timeZone }).format(date);
}
