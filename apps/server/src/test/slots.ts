const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

/**
 * An instant `days` after today's midnight in the test shop's time zone (UTC, as the test
 * databases are set up), at hh:mm: reservation tests book whole slots a few days ahead.
 */
export function slot(days: number, hours: number, minutes = 0): Date {
  const midnight = new Date();
  midnight.setUTCHours(0, 0, 0, 0);
  return new Date(midnight.getTime() + days * DAY + hours * HOUR + minutes * MINUTE);
}
