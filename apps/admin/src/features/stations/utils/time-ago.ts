const DAY = 86_400_000;

// Largest first: the first unit that fits whole is the one spoken ("3 hours ago", not "190 minutes ago").
const units: [Intl.RelativeTimeFormatUnit, number][] = [
  ['year', 365 * DAY],
  ['month', 30 * DAY],
  ['week', 7 * DAY],
  ['day', DAY],
  ['hour', 3_600_000],
  ['minute', 60_000],
  ['second', 1_000],
];

/**
 * How long ago something happened, in the reader's language. A time slightly ahead of `now`
 * (the server's clock runs ahead of the browser's) is read as just now, never as "in 5 seconds".
 */
export function timeAgo(iso: string, now: Date, locale?: string): string {
  const at = Date.parse(iso);
  if (Number.isNaN(at)) return iso;
  const elapsed = Math.max(0, now.getTime() - at);
  const format = new Intl.RelativeTimeFormat(locale, { numeric: 'auto' });
  for (const [unit, size] of units) {
    if (elapsed >= size) return format.format(-Math.floor(elapsed / size), unit);
  }
  return format.format(0, 'second');
}
