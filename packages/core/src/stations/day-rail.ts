import { TZDate } from '@date-fns/tz';

/**
 * screens.md "Time bars": reservations and sessions are bars on a day rail from 06:00 to 24:00 on
 * the shop's wall clock. These are its ends in minutes after local midnight.
 */
export const DAY_RAIL_START_MINUTES = 6 * 60;
export const DAY_RAIL_END_MINUTES = 24 * 60;

/**
 * The instants at which today's rail begins and ends in the shop's time zone (06:00 and the next
 * midnight, local). On a day the clocks change the two are 17 or 19 hours apart when the change
 * falls inside the rail, so they are found on the zone's own calendar, never by adding hours.
 */
export function dayRailBounds(instant: Date, timeZone: string): { start: Date; end: Date } {
  const local = new TZDate(instant.getTime(), timeZone);
  const start = new TZDate(local.getFullYear(), local.getMonth(), local.getDate(), 0, DAY_RAIL_START_MINUTES, timeZone);
  const end = new TZDate(local.getFullYear(), local.getMonth(), local.getDate() + 1, 0, 0, timeZone);
  return { start: new Date(start.getTime()), end: new Date(end.getTime()) };
}
