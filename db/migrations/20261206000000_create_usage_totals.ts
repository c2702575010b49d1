import type { Knex } from 'knex';

/**
 * Usage totals for the usage review (docs/decisions/016): the ended sessions summed per machine
 * and hour of the shop's wall clock, and per member and shop day, kept by triggers so a report over
 * a year reads a few hundred thousand small rows instead of a million sessions. Running sessions
 * are not here; the report adds them as it reads.
 *
 * Times are summed as whole microseconds (bigint), PostgreSQL's own resolution, so taking a
 * session's share away again (an edit, a delete) leaves exactly what was there before.
 *
 * The totals depend on the sessions, the shop's time zone, its weekly hours and its closures
 * (only the open part of each hour does). Sessions add or take away their share; a closure works
 * out its own days again; weekly hours or the time zone mark the totals stale, and the next report
 * works them out again before it reads (usage_totals_refresh()).
 *
 * Writers of shares take a shared advisory lock and a whole-day rebuild takes it exclusively, so
 * a rebuild never reads the sessions while another transaction's share is half applied.
 */

/** The advisory lock of the totals; one number, taken by nothing else. */
const LOCK = 7_260_120_516;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    create table usage_machine_hours (
      machine_id uuid not null,
      -- The instant the hour of the shop's wall clock begins; the day's hours follow as real time,
      -- so a daylight-saving day has 23 or 25 of them and a repeated hour is two rows.
      hour timestamptz not null,
      -- The shop-calendar date, ISO weekday and hour of the wall clock of that instant.
      day date not null,
      weekday smallint not null,
      hour_of_day smallint not null,
      -- Use inside the hour, and the part of it inside the shop's opening hours.
      micros bigint not null,
      open_micros bigint not null,
      -- Sessions started in the hour.
      started integer not null,
      primary key (machine_id, hour)
    )
  `);
  // No foreign keys: a machine or member removed takes their sessions with it, whose trigger takes
  // their share away; reports read the totals through machines and members, so nothing else sees them.
  await knex.raw('create index usage_machine_hours_by_day on usage_machine_hours (day) include (machine_id, weekday, hour_of_day, micros, open_micros, started)');
  await knex.raw(`
    create table usage_member_days (
      member_id uuid not null,
      day date not null,
      micros bigint not null,
      started integer not null,
      primary key (member_id, day)
    )
  `);
  await knex.raw('create index usage_member_days_by_day on usage_member_days (day) include (member_id, micros, started)');
  await knex.raw(`
    create table usage_totals_state (
      id smallint primary key default 1 check (id = 1),
      -- Weekly hours or the time zone changed since the totals were worked out.
      stale boolean not null default false
    )
  `);
  await knex.raw('insert into usage_totals_state (id, stale) values (1, false)');

  // Whole microseconds from a to z, never below zero.
  await knex.raw(`
    create function usage_micros(a timestamptz, z timestamptz) returns bigint
    language sql immutable parallel safe as $$
      select greatest(0, (extract(epoch from z) - extract(epoch from a)) * 1000000)::bigint
    $$
  `);

  // The openings of one shop day as instants, as clearance rule 7 reads the hours: each weekly
  // opening of its weekday unless a closure covers the day; no weekly hours set, open all day.
  await knex.raw(`
    create function usage_openings(p_day date, p_zone text) returns table (a timestamptz, z timestamptz)
    language sql stable as $$
      select (p_day + h.opens_at) at time zone p_zone, (p_day + h.closes_at) at time zone p_zone
      from shop_hours h
      where h.weekday = extract(isodow from p_day)
        and not exists (select 1 from shop_closures c where p_day between c.starts_on and c.ends_on)
      union all
      select p_day::timestamp at time zone p_zone, (p_day + 1)::timestamp at time zone p_zone
      where not exists (select 1 from shop_hours)
        and not exists (select 1 from shop_closures c where p_day between c.starts_on and c.ends_on)
    $$
  `);

  // One session's use [p_start, p_end) cut at the hours of the shop's wall clock: the first hour
  // begins where the wall clock last read a whole hour, each next one 3,600 s of real time later.
  // That holds in every zone whose offsets change by whole hours (all but one island's half-hour
  // summer time in the IANA database). A session of no length has no pieces and counts nowhere.
  await knex.raw(`
    create function usage_pieces(p_start timestamptz, p_end timestamptz, p_zone text)
    returns table (hour timestamptz, day date, weekday smallint, hour_of_day smallint, micros bigint, open_micros bigint, started integer)
    language sql stable as $$
      select h.hour, w.local::date, extract(isodow from w.local)::smallint, extract(hour from w.local)::smallint,
        usage_micros(greatest(p_start, h.hour), least(p_end, h.hour + interval '1 hour')),
        coalesce((
          select sum(usage_micros(greatest(p_start, h.hour, o.a), least(p_end, h.hour + interval '1 hour', o.z)))
          from usage_openings(w.local::date, p_zone) o
        ), 0)::bigint,
        (h.hour <= p_start)::integer
      from generate_series(
          p_start - ((p_start at time zone p_zone) - date_trunc('hour', p_start at time zone p_zone)),
          p_end - interval '1 microsecond',
          interval '1 hour'
        ) h(hour)
        cross join lateral (select h.hour at time zone p_zone as local) w
      where p_end > p_start
    $$
  `);

  // The machine-hour totals of the days p_from … p_to worked out again from the ended sessions.
  await knex.raw(`
    create function usage_totals_rebuild_days(p_from date, p_to date) returns void
    language plpgsql as $$
    declare
      zone text := (select time_zone from shop where id = 1);
    begin
      perform pg_advisory_xact_lock(${LOCK});
      delete from usage_machine_hours where day between p_from and p_to;
      insert into usage_machine_hours (machine_id, hour, day, weekday, hour_of_day, micros, open_micros, started)
      select s.machine_id, x.hour, x.day, x.weekday, x.hour_of_day, sum(x.micros)::bigint, sum(x.open_micros)::bigint, sum(x.started)::integer
      from machine_sessions s cross join lateral usage_pieces(s.started_at, s.ended_at, zone) x
      where s.ended_at > (p_from::timestamp at time zone zone) and s.started_at < ((p_to + 1)::timestamp at time zone zone)
        and x.day between p_from and p_to
      group by 1, 2, 3, 4, 5;
    end
    $$
  `);

  // Every total worked out again from the ended sessions, set-based.
  await knex.raw(`
    create function usage_totals_rebuild() returns void
    language plpgsql as $$
    declare
      zone text := (select time_zone from shop where id = 1);
    begin
      perform pg_advisory_xact_lock(${LOCK});
      delete from usage_machine_hours;
      delete from usage_member_days;
      with p as materialized (
        select s.machine_id, s.member_id, x.*
        from machine_sessions s cross join lateral usage_pieces(s.started_at, s.ended_at, zone) x
        where s.ended_at is not null
      ),
      m as (
        insert into usage_machine_hours (machine_id, hour, day, weekday, hour_of_day, micros, open_micros, started)
        select machine_id, hour, day, weekday, hour_of_day, sum(micros)::bigint, sum(open_micros)::bigint, sum(started)::integer
        from p group by 1, 2, 3, 4, 5
      )
      insert into usage_member_days (member_id, day, micros, started)
      select member_id, day, sum(micros)::bigint, sum(started)::integer from p group by 1, 2;
      update usage_totals_state set stale = false where id = 1;
    end
    $$
  `);

  // What a report calls first: stale totals are worked out again, once, whoever asks first.
  await knex.raw(`
    create function usage_totals_refresh() returns void
    language plpgsql as $$
    begin
      if (select stale from usage_totals_state where id = 1) then
        perform pg_advisory_xact_lock(${LOCK});
        -- A new statement, a new snapshot: another report may have rebuilt while this one waited.
        if (select stale from usage_totals_state where id = 1) then
          perform usage_totals_rebuild();
        end if;
      end if;
    end
    $$
  `);

  // Sessions add their share when they end and take it away when changed or removed. One
  // statement's rows are applied together (a bulk insert is one set-based pass). Only ended
  // sessions count, and an update that changes none of the four columns changes nothing.
  await knex.raw(`
    create function usage_totals_follow_sessions() returns trigger
    language plpgsql as $$
    declare
      changes text;
      any_change boolean;
    begin
      if tg_op = 'TRUNCATE' then
        perform pg_advisory_xact_lock(${LOCK});
        delete from usage_machine_hours;
        delete from usage_member_days;
        return null;
      end if;
      changes := case tg_op
        when 'INSERT' then
          'select machine_id, member_id, started_at, ended_at, 1 as sign from new_rows where ended_at is not null'
        when 'DELETE' then
          'select machine_id, member_id, started_at, ended_at, -1 as sign from old_rows where ended_at is not null'
        else
          'select o.machine_id, o.member_id, o.started_at, o.ended_at, -1 as sign
             from old_rows o join new_rows n on n.id = o.id
             where o.ended_at is not null
               and (o.machine_id, o.member_id, o.started_at, o.ended_at) is distinct from (n.machine_id, n.member_id, n.started_at, n.ended_at)
           union all
           select n.machine_id, n.member_id, n.started_at, n.ended_at, 1
             from old_rows o join new_rows n on n.id = o.id
             where n.ended_at is not null
               and (o.machine_id, o.member_id, o.started_at, o.ended_at) is distinct from (n.machine_id, n.member_id, n.started_at, n.ended_at)'
      end;
      execute 'select exists (' || changes || ')' into any_change;
      if not any_change then
        return null;
      end if;
      perform pg_advisory_xact_lock_shared(${LOCK});
      execute format($f$
        with c as (%s),
        p as materialized (
          select c.machine_id, c.member_id, c.sign, x.*
          from c cross join lateral usage_pieces(c.started_at, c.ended_at, (select time_zone from shop where id = 1)) x
        ),
        m as (
          insert into usage_machine_hours as t (machine_id, hour, day, weekday, hour_of_day, micros, open_micros, started)
          select machine_id, hour, day, weekday, hour_of_day, sum(sign * micros)::bigint, sum(sign * open_micros)::bigint, sum(sign * started)::integer
          from p group by 1, 2, 3, 4, 5
          -- Rows in one order, so two writers meeting on the same rows wait rather than deadlock.
          order by 1, 2
          on conflict (machine_id, hour) do update
            set micros = t.micros + excluded.micros, open_micros = t.open_micros + excluded.open_micros, started = t.started + excluded.started
        )
        insert into usage_member_days as t (member_id, day, micros, started)
        select member_id, day, sum(sign * micros)::bigint, sum(sign * started)::integer
        from p group by 1, 2
        order by 1, 2
        on conflict (member_id, day) do update set micros = t.micros + excluded.micros, started = t.started + excluded.started
      $f$, changes);
      return null;
    end
    $$
  `);
  await knex.raw(`
    create trigger machine_sessions_usage_totals_insert after insert on machine_sessions
    referencing new table as new_rows for each statement execute function usage_totals_follow_sessions()
  `);
  await knex.raw(`
    create trigger machine_sessions_usage_totals_update after update on machine_sessions
    referencing old table as old_rows new table as new_rows for each statement execute function usage_totals_follow_sessions()
  `);
  await knex.raw(`
    create trigger machine_sessions_usage_totals_delete after delete on machine_sessions
    referencing old table as old_rows for each statement execute function usage_totals_follow_sessions()
  `);
  await knex.raw(`
    create trigger machine_sessions_usage_totals_truncate after truncate on machine_sessions
    for each statement execute function usage_totals_follow_sessions()
  `);

  // A closure added, moved or removed works out the days it covered and covers. While the totals
  // are stale the whole rebuild to come covers them.
  await knex.raw(`
    create function usage_totals_follow_closures() returns trigger
    language plpgsql as $$
    begin
      if (select stale from usage_totals_state where id = 1) then
        return null;
      end if;
      if tg_op in ('UPDATE', 'DELETE') then
        perform usage_totals_rebuild_days(old.starts_on, old.ends_on);
      end if;
      if tg_op in ('INSERT', 'UPDATE') then
        perform usage_totals_rebuild_days(new.starts_on, new.ends_on);
      end if;
      return null;
    end
    $$
  `);
  await knex.raw(`
    create trigger shop_closures_usage_totals after insert or delete or update of starts_on, ends_on on shop_closures
    for each row execute function usage_totals_follow_closures()
  `);

  // Weekly hours and the time zone touch every day: the totals are marked stale, and the next
  // report works them out again.
  await knex.raw(`
    create function usage_totals_mark_stale() returns trigger
    language plpgsql as $$
    begin
      update usage_totals_state set stale = true where id = 1 and not stale;
      return null;
    end
    $$
  `);
  await knex.raw(`
    create trigger shop_hours_usage_totals after insert or update or delete or truncate on shop_hours
    for each statement execute function usage_totals_mark_stale()
  `);
  await knex.raw(`
    create trigger shop_usage_totals after update of time_zone on shop
    for each row when (old.time_zone is distinct from new.time_zone) execute function usage_totals_mark_stale()
  `);

  await knex.raw('select usage_totals_rebuild()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger shop_usage_totals on shop');
  await knex.raw('drop trigger shop_hours_usage_totals on shop_hours');
  await knex.raw('drop trigger shop_closures_usage_totals on shop_closures');
  for (const event of ['insert', 'update', 'delete', 'truncate']) await knex.raw(`drop trigger machine_sessions_usage_totals_${event} on machine_sessions`);
  await knex.raw('drop function usage_totals_mark_stale()');
  await knex.raw('drop function usage_totals_follow_closures()');
  await knex.raw('drop function usage_totals_follow_sessions()');
  await knex.raw('drop function usage_totals_refresh()');
  await knex.raw('drop function usage_totals_rebuild()');
  await knex.raw('drop function usage_totals_rebuild_days(date, date)');
  await knex.raw('drop function usage_pieces(timestamptz, timestamptz, text)');
  await knex.raw('drop function usage_openings(date, text)');
  await knex.raw('drop function usage_micros(timestamptz, timestamptz)');
  await knex.raw('drop table usage_totals_state');
  await knex.raw('drop table usage_member_days');
  await knex.raw('drop table usage_machine_hours');
}
