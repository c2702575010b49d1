import type { Knex } from 'knex';
import { demoAccounts } from './02_people';

/** How far back the invented history goes, in shop days before today. */
export const USAGE_HISTORY_DAYS = 91;

/**
 * Three months of the demo shop's floor up to yesterday, so the usage review has something to
 * say on first start: sessions inside opening hours by members signed off on the machine, a
 * reservation on each reservable machine most open days (some cancelled, some not turned up to),
 * and refused scans with their reasons. All of it ended in the past: nothing runs, nothing is
 * booked ahead. Made in a few set-based statements.
 *
 * The three accounts README lists take no part, so what a newcomer sees of them (their
 * reservations, no-shows, record) stays as the other seeds made it. No-shows are all older than a
 * month, past any machine's no-show window, so nobody starts suspended. The machines' meters are
 * lifetime readings, larger than these three months, and are left as they are so the upkeep
 * seed's due dates hold.
 *
 * Choices that look random come from hashes of the machine, day and slot, so every set-up makes
 * the same history relative to its day.
 */
export async function seed(knex: Knex): Promise<void> {
  const demoEmails = demoAccounts.map((account) => account.email);
  const bindings = { days: USAGE_HISTORY_DAYS, demo: demoEmails };

  // Open days and their openings as instants, from the shop's weekly hours, closures excepted.
  const openings = `
    shop_tz as (select time_zone as tz from shop where id = 1),
    shop_today as (select (now() at time zone tz)::date as today, tz from shop_tz),
    days as (
      select (st.today - g)::date as day, g as ago, st.tz
      from shop_today st cross join generate_series(1, :days::int) g
      where not exists (select 1 from shop_closures c where (st.today - g)::date between c.starts_on and c.ends_on)
    ),
    openings as (
      select d.day, d.ago, (d.day + h.opens_at) at time zone d.tz as opens, (d.day + h.closes_at) at time zone d.tz as closes
      from days d join shop_hours h on h.weekday = extract(isodow from d.day)
    ),
    -- Who may be seen on each machine: active members and instructors with a standing sign-off on
    -- one of its trainings, other than the accounts README lists.
    eligible as (
      select mt.machine_id, array_agg(distinct s.member_id order by s.member_id) as ids
      from machine_trainings mt
      join sign_offs s on s.training_id = mt.training_id and s.revoked_at is null
      join members p on p.id = s.member_id and p.active and p.email <> all(:demo::text[])
      group by mt.machine_id
    ),
    pick as (select m.id as machine_id, m.reservable, m.safety_checklist, e.ids from machines m join eligible e on e.machine_id = m.id)`;
  const hash = (sql: string) => `abs(hashtext(${sql}))`;

  // Sessions: 80-minute slots from each opening; about half the slots used, 25 to 70 minutes each.
  await knex.raw(
    `with ${openings}
     insert into machine_sessions (machine_id, member_id, started_at, ended_at, ended_by, hours, checklist)
     select p.machine_id, p.ids[1 + ${hash("p.machine_id::text || o.day || slot")} % cardinality(p.ids)],
            o.opens + slot * interval '80 minutes', o.opens + slot * interval '80 minutes' + minutes * interval '1 minute',
            'member', round(minutes / 60.0, 2), p.safety_checklist
     from openings o cross join pick p
     cross join lateral generate_series(0, floor(extract(epoch from o.closes - o.opens) / 4800)::int - 1) slot
     cross join lateral (select 25 + ${hash("o.day || p.machine_id::text || slot || 'length'")} % 46 as minutes) len
     where ${hash("p.machine_id::text || slot || o.day || 'used'")} % 100 < 55`,
    bindings,
  );

  // Reservations: one an hour after opening on most open days on each reservable machine. One in
  // nine cancelled; one in eight not turned up to, only those over a month ago; the rest used.
  await knex.raw(
    `with ${openings},
     wanted as (
       select p.machine_id, p.ids[1 + ${hash("p.machine_id::text || o.day || 'booked'")} % cardinality(p.ids)] as member_id,
              o.opens + interval '1 hour' as starts, ${hash("o.day || p.machine_id::text || 'fate'")} % 72 as fate, o.ago
       from openings o cross join pick p
       where p.reservable and o.closes - o.opens >= interval '3 hours' and ${hash("p.machine_id::text || o.day || 'reserve'")} % 10 < 7
     )
     insert into reservations (machine_id, member_id, starts_at, ends_at, blocked_until, status, created_at, cancelled_at, checked_in_at)
     select w.machine_id, w.member_id, w.starts, w.starts + interval '1 hour', w.starts + interval '1 hour',
            case when w.fate % 9 = 0 then 'cancelled' when w.fate % 8 = 0 and w.ago > 31 then 'no_show' else 'checked_in' end,
            w.starts - interval '3 days',
            case when w.fate % 9 = 0 then w.starts - interval '1 day' end,
            case when w.fate % 9 = 0 or (w.fate % 8 = 0 and w.ago > 31) then null else w.starts + interval '2 minutes' end
     from wanted w
     -- Clear of any live claim already on the machine, such as a class meeting.
     where not exists (
       select 1 from reservations r
       where r.machine_id = w.machine_id and r.status in ('active', 'checked_in')
         and tstzrange(r.starts_at, r.blocked_until) && tstzrange(w.starts, w.starts + interval '1 hour')
     )`,
    bindings,
  );

  // Refused scans: a few on most open days, most of them for a missing or lapsed sign-off.
  await knex.raw(
    `with ${openings},
     reasons(n, code, rule) as (values
       (0, 'sign_off_missing', 2), (1, 'sign_off_missing', 2), (2, 'sign_off_missing', 2), (3, 'sign_off_expired', 2),
       (4, 'waiver_missing', 1), (5, 'machine_in_use', 5), (6, 'supervisor_required', 3), (7, 'unknown_badge', null)),
     strangers as (
       select array_agg(p.id order by p.id) as ids from members p where p.active and p.role = 'member' and p.email <> all(:demo::text[])
     ),
     first_training as (select distinct on (machine_id) machine_id, training_id from machine_trainings order by machine_id, training_id)
     insert into station_denials (at, machine_id, member_id, code, rule, training_id)
     select o.opens + (${hash("o.day || m.id::text || k || 'when'")} % greatest(1, extract(epoch from o.closes - o.opens)::int)) * interval '1 second',
            m.id,
            case when r.code <> 'unknown_badge' then s.ids[1 + ${hash("m.id::text || o.day || k || 'who'")} % cardinality(s.ids)] end,
            r.code, r.rule,
            case when r.code like 'sign_off_%' then ft.training_id end
     from openings o cross join machines m cross join strangers s
     join first_training ft on ft.machine_id = m.id
     cross join lateral generate_series(0, ${hash("m.id::text || o.day || 'count'")} % 3) k
     join reasons r on r.n = ${hash("o.day || m.id::text || k || 'why'")} % 8
     where cardinality(s.ids) > 0`,
    bindings,
  );
}
