/*
 * SQL fragments for statements that read the shop's hours together with other facts in one round
 * trip (the station's scan, the wall board). Each is a scalar sub-select for a select list.
 */

/** The weekly hours as a JSON array of `{weekday, opensAt, closesAt}`, times as 'HH:MM'. */
export const WEEKLY_HOURS_JSON = `(
    select coalesce(json_agg(json_build_object(
      'weekday', h.weekday, 'opensAt', to_char(h.opens_at, 'HH24:MI'), 'closesAt', to_char(h.closes_at, 'HH24:MI'))), '[]')
    from shop_hours h
  )`;

/**
 * The closures touching the days from yesterday to `daysAhead` days after the database's date, as a
 * JSON array of `{startsOn, endsOn, reason}`: a day either side of what the caller looks at, since
 * the shop's date may be a day off the database's.
 */
export function closuresJson(daysAhead: number): string {
  if (!Number.isInteger(daysAhead) || daysAhead < 0) throw new Error(`closuresJson needs a whole number of days, not ${daysAhead}`);
  return `(
    select coalesce(json_agg(json_build_object('startsOn', c.starts_on, 'endsOn', c.ends_on, 'reason', c.reason)), '[]')
    from shop_closures c
    where c.ends_on >= current_date - 1 and c.starts_on <= current_date + ${daysAhead}
  )`;
}
