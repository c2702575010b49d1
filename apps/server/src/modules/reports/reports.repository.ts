import type { Db } from '../../lib/db';
import { preparedRows } from '../../lib/prepared';

/** A report's range: shop-calendar dates, both included, read on the wall clock of `timeZone`. */
export interface ReportRange {
  from: string;
  to: string;
  timeZone: string;
}

/*
 * Every statement takes $1 (first day), $2 (last day) and $3 (the shop's IANA time zone). The
 * range's instants are the shop's midnights: the first day's (LO) and the one after the last day's (HI).
 */
const LO = `($1::date::timestamp at time zone $3::text)`;
const HI = `(($2::date + 1)::timestamp at time zone $3::text)`;

/*
 * Use per machine and hour of the shop's wall clock in the range. Ended sessions come summed from
 * usage_machine_hours, kept by triggers as sessions end (db migration 20261206000000,
 * docs/decisions/016); the few running ones are cut into the same pieces here, counted up to now.
 * A piece never crosses the shop's midnight, so the range's days select exactly its use inside
 * the range. Times are whole microseconds.
 */
const HOURS = `live as (
  select s.machine_id, s.member_id, x.day, x.weekday, x.hour_of_day, x.micros, x.open_micros, x.started
  from machine_sessions s cross join lateral usage_pieces(s.started_at, greatest(now(), s.started_at), $3::text) x
  where s.ended_at is null and s.started_at < ${HI} and x.day between $1::date and $2::date
),
hours as (
  select t.machine_id, t.day, t.weekday, t.hour_of_day, t.micros, t.open_micros, t.started
  from usage_machine_hours t where t.day between $1::date and $2::date
  union all
  select l.machine_id, l.day, l.weekday, l.hour_of_day, l.micros, l.open_micros, l.started from live l
),
heatmap as (
  select coalesce(json_agg(json_build_object('weekday', c.weekday, 'hour', c.hour, 'hours', c.hours) order by c.weekday, c.hour), '[]') as cells
  from (
    select h.weekday::int as weekday, h.hour_of_day::int as hour, ${hoursOf('sum(h.micros)')} as hours
    from hours h group by 1, 2 having sum(h.micros) > 0
  ) c
)`;

/*
 * The shop's open time in the range, in seconds: each day's openings as clearance rule 7 reads the
 * hours (usage_openings: the weekday's openings unless a closure covers the day; no weekly hours
 * set, open all day).
 */
const OPEN_SECONDS = `open_time as (
  select coalesce(sum(extract(epoch from o.z) - extract(epoch from o.a)), 0) as seconds
  from generate_series($1::date, $2::date, interval '1 day') d cross join lateral usage_openings(d::date, $3::text) o
)`;

/** Hours, to the hundredth, of a number of microseconds. */
function hoursOf(micros: string): string {
  return `round((${micros}) / 3600000000.0, 2)::float8`;
}

/*
 * The statements by grouping answer one row: `rows` and `heatmap` as JSON. Utilization is the use
 * inside open hours over the open hours.
 */
const MACHINES_SQL = `
with ${HOURS}, ${OPEN_SECONDS},
per_machine as (
  select h.machine_id, sum(h.micros) as micros, sum(h.open_micros) as open_micros, sum(h.started) as started from hours h group by 1
)
select coalesce(json_agg(json_build_object(
    'machineId', m.id, 'machineName', m.name, 'sessions', coalesce(pm.started, 0)::int,
    'hours', ${hoursOf('coalesce(pm.micros, 0)')}, 'openHours', round(o.seconds / 3600, 2)::float8,
    'utilization', case when o.seconds > 0 then round(coalesce(pm.open_micros, 0) / 1000000.0 / o.seconds, 4)::float8 end
  ) order by m.name), '[]') as rows,
  (select cells from heatmap) as heatmap
from machines m cross join open_time o
left join per_machine pm on pm.machine_id = m.id
`;

const MEMBERS_SQL = `
with ${HOURS},
per_member as (
  select d.member_id, sum(d.micros) as micros, sum(d.started) as started from (
    select t.member_id, t.micros, t.started from usage_member_days t where t.day between $1::date and $2::date
    union all
    select l.member_id, l.micros, l.started from live l
  ) d
  group by 1 having sum(d.micros) > 0
)
select coalesce(json_agg(json_build_object(
    'memberId', p.id, 'memberName', p.first_name || ' ' || p.last_name, 'sessions', pm.started::int, 'hours', ${hoursOf('pm.micros')}
  ) order by pm.micros desc, pm.started desc, p.first_name || ' ' || p.last_name), '[]') as rows,
  (select cells from heatmap) as heatmap
from per_member pm join members p on p.id = pm.member_id
`;

const DAYS_SQL = `
with ${HOURS},
-- A session counts on the day of its start: its first piece carries it.
per_day as (select h.day, sum(h.micros) as micros, sum(h.started) as sessions from hours h group by 1)
select coalesce(json_agg(json_build_object(
    'date', to_char(d, 'YYYY-MM-DD'), 'sessions', coalesce(pd.sessions, 0)::int, 'hours', ${hoursOf('coalesce(pd.micros, 0)')}
  ) order by d), '[]') as rows,
  (select cells from heatmap) as heatmap
from generate_series($1::date, $2::date, interval '1 day') d
left join per_day pd on pd.day = d::date
`;

const RESERVATIONS_SQL = `
select count(*)::int as made,
  (count(*) filter (where r.checked_in_at is not null))::int as used,
  (count(*) filter (where r.status = 'no_show'))::int as "noShows",
  (count(*) filter (where r.status = 'cancelled'))::int as cancelled
from reservations r
where r.kind = 'member' and r.starts_at >= ${LO} and r.starts_at < ${HI}
`;

const DENIALS_SQL = `
select d.code, d.rule::int as rule, count(*)::int as count
from station_denials d
where d.at >= ${LO} and d.at < ${HI}
group by d.code, d.rule
order by count desc, d.code
`;

const TRAININGS_SQL = `
select t.id as "trainingId", t.name as "trainingName", count(*)::int as count
from station_denials d join trainings t on t.id = d.training_id
where d.training_id is not null and d.at >= ${LO} and d.at < ${HI} and d.code in ('sign_off_missing', 'sign_off_expired')
group by t.id
order by count desc, t.name
`;

const SIGN_OFFS_SQL = `
select i.id as "instructorId", i.first_name || ' ' || i.last_name as "instructorName", count(*)::int as count
from sign_offs s join members i on i.id = s.signed_by
where s.signed_at >= ${LO} and s.signed_at < ${HI}
group by i.id
order by count desc, "instructorName"
`;

export const reportStatements = {
  machine: MACHINES_SQL,
  member: MEMBERS_SQL,
  day: DAYS_SQL,
  reservations: RESERVATIONS_SQL,
  denials: DENIALS_SQL,
  trainings: TRAININGS_SQL,
  signOffs: SIGN_OFFS_SQL,
} as const;

export function reportsRepository(db: Db) {
  async function rows<Row>(statement: keyof typeof reportStatements, range: ReportRange): Promise<Row[]> {
    // Prepared, so a report's eight statements are planned once per connection.
    return preparedRows<Row>(db, `usage_report_${statement}`, reportStatements[statement], [range.from, range.to, range.timeZone]);
  }
  return {
    rows,
    /** Totals marked stale (weekly hours or the time zone changed) are worked out again first. */
    async refreshTotals(): Promise<void> {
      await db.raw('select usage_totals_refresh()');
    },
    async timeZone(): Promise<string> {
      const row = await db('shop').first('time_zone').where({ id: 1 });
      return (row?.time_zone as string | undefined) ?? 'UTC';
    },
  };
}
