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
