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
 * Times are worked in epoch seconds as double precision: summing a million numerics costs several
 * times as much, and a hundredth of an hour is all the report shows.
 */
const LO = `($1::date::timestamp at time zone $3::text)`;
const HI = `(($2::date + 1)::timestamp at time zone $3::text)`;
const epoch = (sql: string) => `date_part('epoch', ${sql})`;

/*
 * The use of each session inside the range, [a, z) in epoch seconds: clipped to the range, and a
 * running session counted up to now. The bounds are worked out once (a row of their own), not per
 * session. Ended sessions are found by their end through machine_sessions_ended_at (a recent range
 * is that index's tail); running ones, a few, through the one-running-per-machine index.
 */
const USED = `bounds as (select ${LO} as lo, ${HI} as hi, ${epoch(LO)} as lo_e, ${epoch(HI)} as hi_e),
used as (
  select s.machine_id, s.member_id, s.started_at >= b.lo as started_in_range,
    greatest(${epoch('s.started_at')}, b.lo_e) as a, least(${epoch('s.ended_at')}, b.hi_e) as z
  from machine_sessions s cross join bounds b
  where s.ended_at > b.lo and s.started_at < b.hi
  union all
  select s.machine_id, s.member_id, s.started_at >= b.lo,
    greatest(${epoch('s.started_at')}, b.lo_e), least(${epoch('greatest(now(), s.started_at)')}, b.hi_e)
  from machine_sessions s cross join bounds b
  where s.ended_at is null and s.started_at < b.hi
)`;

/*
 * The shop's openings in the range, each weekly opening on each day of its weekday except days a
 * closure covers; with no weekly hours set the shop counts as open all day (as clearance rule 7
 * reads it), closures still excepted. `ladder` holds them sorted as epoch seconds with the open
 * seconds before each, so the open time before any instant t is one binary search (width_bucket)
 * and a subtraction: openBefore(t). A session's use inside open hours is then
 * openBefore(z) − openBefore(a), without meeting every session with every opening.
 */
const OPENINGS = `days as (
  select d::date as day from generate_series($1::date, $2::date, interval '1 day') d
  where not exists (select 1 from shop_closures c where d::date between c.starts_on and c.ends_on)
),
openings as (
  select ${epoch(`(dy.day + h.opens_at) at time zone $3::text`)} as a, ${epoch(`(dy.day + h.closes_at) at time zone $3::text`)} as z
  from days dy join shop_hours h on h.weekday = extract(isodow from dy.day)
  union all
  select ${epoch(`dy.day::timestamp at time zone $3::text`)}, ${epoch(`(dy.day + 1)::timestamp at time zone $3::text`)}
  from days dy where not exists (select 1 from shop_hours)
),
ladder as (
  select coalesce(array_agg(o.a order by o.a), '{}') as starts, coalesce(array_agg(o.z order by o.a), '{}') as ends,
    coalesce(array_agg(o.before order by o.a), '{}') as before, coalesce(sum(o.z - o.a), 0) as total
  from (select a, z, coalesce(sum(z - a) over (order by a rows between unbounded preceding and 1 preceding), 0) as before from openings) o
)`;
/** Open seconds before instant `t`, given `i` = width_bucket(t, l.starts): the openings starting at or before t. */
const openBefore = (t: string, i: string) =>
  `(case when ${i} = 0 then 0 else l.before[${i}] + greatest(0, least(${t}, l.ends[${i}]) - l.starts[${i}]) end)`;

const hoursOf = (sql: string) => `round((${sql})::numeric, 2)::float8`;

/*
 * The use summed per hour of the shop's wall clock. The range starts at a local midnight, so its
 * epoch modulo 3600 (s) is where the wall clock's hours fall on the epoch; each hour after is
 * 3600 s of real time later, so a daylight-saving day has 23 or 25 hours and the repeated hour
 * counts twice, as the clock shows it. That holds for every zone whose offsets differ by whole
 * hours, which is all but one island's half-hour summer time in the IANA database.
 *
 * A session is spread over the hours it covers without making a row per hour: its first hour (ba)
 * and last hour (bz) take their parts, and the hours between are full, counted by a +1 after ba and
 * a −1 at bz summed along the hours. Both ends, and the grouping by machine or member, are summed
 * in one pass over the sessions (grouping sets). Only the summed hours are turned into wall-clock
 * days and hours; `heatmap` gathers them by weekday and hour.
 */
function hourly(by: 'machine_id' | 'member_id' | null): string {
  const byKey = by ? `, (sp.${by})` : '';
  const openUse = by === 'machine_id' ? 'sum(sp.open_seconds) as open_use,' : '';
  const openSeconds = by === 'machine_id' ? `, ${openBefore('u.z', 'w.iz')} - ${openBefore('u.a', 'w.ia')} as open_seconds` : '';
  return `shift as (select mod(lo_e::bigint, 3600)::float8 as s from bounds),
ends as (
  select grouping(sp.ba, sp.bz${by ? `, sp.${by}` : ''}) as grouped, coalesce(sp.ba, sp.bz) as b${by ? `, sp.${by} as key` : ''},
    sum(least(sp.z, (sp.ba + 1) * 3600 + sp.s) - sp.a) as first_seconds,
    sum(case when sp.bz > sp.ba then sp.z - (sp.bz * 3600 + sp.s) else 0 end) as last_seconds,
    count(*) filter (where sp.bz > sp.ba + 1) as spanning,
    count(*) filter (where sp.started_in_range) as started,
    ${openUse}
    sum(sp.z - sp.a) as seconds
  from (
    select u.*, sh.s, floor((u.a - sh.s) / 3600)::bigint as ba, (ceil((u.z - sh.s) / 3600) - 1)::bigint as bz${openSeconds}
    from used u cross join shift sh${
      by === 'machine_id' ? ' cross join ladder l cross join lateral (select width_bucket(u.a, l.starts) as ia, width_bucket(u.z, l.starts) as iz) w' : ''
    }
    where u.z > u.a
  ) sp
  group by grouping sets ((sp.ba), (sp.bz)${byKey})
),
firsts as (select * from ends where grouped = ${by ? 3 : 1}),
lasts as (select * from ends where grouped = ${by ? 5 : 2}),
hourly as (
  select b.b, coalesce(f.first_seconds, 0) + coalesce(l.last_seconds, 0) as parts, coalesce(f.started, 0) as started,
    coalesce(sum(f.spanning) over (order by b.b rows between unbounded preceding and 1 preceding), 0)
      - coalesce(sum(l.spanning) over (order by b.b), 0) as full_sessions
  from generate_series((select min(b) from firsts), greatest((select max(b) from firsts), (select max(b) from lasts))) b(b)
  left join firsts f on f.b = b.b
  left join lasts l on l.b = b.b
),
wall as (
  select to_timestamp(h.b * 3600 + sh.s) at time zone $3::text as local, (h.parts + 3600 * h.full_sessions) / 3600 as hours, h.started
  from hourly h cross join shift sh
  where h.parts > 0 or h.full_sessions > 0 or h.started > 0
),
heatmap as (
  select coalesce(json_agg(json_build_object('weekday', c.weekday, 'hour', c.hour, 'hours', c.hours) order by c.weekday, c.hour), '[]') as cells
  from (
    select extract(isodow from w.local)::int as weekday, extract(hour from w.local)::int as hour, ${hoursOf('sum(w.hours)')} as hours
    from wall w group by 1, 2 having sum(w.hours) > 0
  ) c
)`;
}

/*
 * The statements by grouping answer one row: `rows` and `heatmap` as JSON, from one pass over the
 * range's sessions.
 */
const MACHINES_SQL = `
with ${USED}, ${OPENINGS}, ${hourly('machine_id')}
select coalesce(json_agg(json_build_object(
    'machineId', m.id, 'machineName', m.name, 'sessions', coalesce(e.started, 0),
    'hours', ${hoursOf('coalesce(e.seconds, 0) / 3600')}, 'openHours', ${hoursOf('l.total / 3600')},
    'utilization', case when l.total > 0 then round((coalesce(e.open_use, 0) / l.total)::numeric, 4)::float8 end
  ) order by m.name), '[]') as rows,
  (select cells from heatmap) as heatmap
from machines m cross join ladder l
left join ends e on e.grouped = 6 and e.key = m.id
`;

const MEMBERS_SQL = `
with ${USED}, ${hourly('member_id')}
select coalesce(json_agg(json_build_object(
    'memberId', p.id, 'memberName', p.first_name || ' ' || p.last_name, 'sessions', e.started, 'hours', ${hoursOf('e.seconds / 3600')}
  ) order by e.seconds desc, e.started desc, p.first_name || ' ' || p.last_name), '[]') as rows,
  (select cells from heatmap) as heatmap
from ends e join members p on p.id = e.key
where e.grouped = 6
`;

const DAYS_SQL = `
with ${USED}, ${hourly(null)},
-- A session counts on the day of its start: the hour it starts in is its first (ba).
per_day as (select w.local::date as day, sum(w.hours) as hours, sum(w.started) as sessions from wall w group by 1)
select coalesce(json_agg(json_build_object(
    'date', to_char(d, 'YYYY-MM-DD'), 'sessions', coalesce(pd.sessions, 0), 'hours', ${hoursOf('coalesce(pd.hours, 0)')}
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
    async timeZone(): Promise<string> {
      const row = await db('shop').first('time_zone').where({ id: 1 });
      return (row?.time_zone as string | undefined) ?? 'UTC';
    },
  };
}
