/**
 * Fills a migrated, empty database with a busy year for the usage-report benchmark (see
 * scripts/bench-reports.mjs): about 800 members, 30 machines, 1,000,000 sessions over the year
 * before now, a year of reservations (no-shows and cancellations among them), refused scans with
 * their reasons, sign-offs given through the year, weekly hours and closures. Everything is made
 * by set-based statements. Writes the admin's e-mail and password, as JSON, to the file named by
 * BENCH_OUTPUT. Never run it against a database that holds real data.
 */
import { randomBytes } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import knexFactory from 'knex';
import { env, timed } from './bench-support';
import { knexConfig } from './config';
import { hashPassword } from './passwords';

const MEMBERS = 800;
const INSTRUCTORS = 12;
const MACHINES = 30;
const TRAININGS = 12;
const SESSIONS = 1_000_000;
const DENIALS = 150_000;
/** Each machine has a reservation every RESERVATION_EVERY_HOURS over the year. */
const RESERVATION_EVERY_HOURS = 4;

async function main(): Promise<void> {
  const db = knexFactory(knexConfig(env('DATABASE_URL'), { min: 1, max: 2 }));
  const output = env('BENCH_OUTPUT');
  const password = randomBytes(12).toString('base64url');
  const email = 'admin@bench.example.org';
  try {
    await timed('shop, members, trainings, machines, hours and closures', async () => {
      await db('shop').where({ id: 1 }).update({ name: 'Bench Shop', town: 'Benchton', time_zone: 'America/Chicago' });
      await db('members').insert({ email, first_name: 'Bench', last_name: 'Admin', role: 'admin', password_hash: await hashPassword(password) });
      await db.raw(
        `insert into members (email, first_name, last_name, role, password_hash)
         select 'member' || g || '@bench.example.org', 'First' || g, 'Last' || g,
                case when g <= ? then 'instructor' else 'member' end, '$argon2id$v=19$m=19456,t=2,p=1$bench$bench'
         from generate_series(1, ?) g`,
        [INSTRUCTORS, MEMBERS],
      );
      await db.raw(`insert into trainings (name, validity_months) select 'Training ' || g, 24 from generate_series(1, ?) g`, [TRAININGS]);
      await db.raw(`insert into areas (name, sort_order) select 'Area ' || g, g from generate_series(1, 3) g`);
      await db.raw(
        `with a as (select array_agg(id order by sort_order) ids from areas)
         insert into machines (name, category, area_id)
         select 'Machine ' || lpad(g::text, 2, '0'), (array['lathe', 'mill', 'mig_welder', 'tig_welder', 'band_saw', 'drill_press', 'surface_grinder'])[1 + g % 7], a.ids[1 + g % 3]
         from generate_series(1, ?) g, a`,
        [MACHINES],
      );
      await db.raw(
        `insert into machine_trainings (machine_id, training_id)
         select m.id, t.id
         from (select id, row_number() over (order by name) n from machines) m
         join (select id, row_number() over (order by name) n from trainings) t on t.n = 1 + m.n % ${TRAININGS}`,
      );
      // Tuesday to Friday 10:00–22:00, Saturday and Sunday 09:00–18:00, closed Mondays; a closure a month.
      await db.raw(
        `insert into shop_hours (weekday, opens_at, closes_at)
         select d, case when d <= 5 then time '10:00' else time '09:00' end, case when d <= 5 then time '22:00' else time '18:00' end
         from generate_series(2, 7) d`,
      );
      await db.raw(
        `insert into shop_closures (starts_on, ends_on, reason)
         select current_date + g * 30, current_date + g * 30 + 1, 'Closed for cleaning' from generate_series(-12, 0) g`,
      );
      // New weekly hours mark the usage totals stale; worked out now (nothing to sum yet), the
      // sessions' trigger keeps them from here and the first report does not rebuild them.
      await db.raw('select usage_totals_refresh()');
    });

    await timed(`${SESSIONS.toLocaleString('en')} sessions over the year, with their usage totals`, async () => {
      // One statement, so the usage-totals trigger sums them in one set-based pass.
      // Each machine's sessions follow one another through the year, 5 to 14 minutes each, by members spread evenly.
      await db.raw(
        `with m as (select array_agg(id order by name) ids from machines),
              p as (select array_agg(id order by email) ids from members)
         insert into machine_sessions (machine_id, member_id, started_at, ended_at, ended_by, hours, checklist)
         select m.ids[1 + g % ${MACHINES}], p.ids[(1 + (g::bigint * 7919) % ${MEMBERS + 1})::int], s.started,
                s.started + s.minutes * interval '1 minute', 'member', round(s.minutes / 60.0, 2), '[]'::jsonb
         from generate_series(0, ? - 1) g cross join m cross join p
         cross join lateral (
           select now() - interval '365 days' + (g / ${MACHINES}) * (interval '365 days' / (? / ${MACHINES})) as started, 5 + g % 10 as minutes
         ) s`,
        [SESSIONS, SESSIONS],
      );
    });

    await timed('a year of reservations, refused scans and sign-offs', async () => {
      // One in ten a no-show, one in fifteen cancelled, the rest used.
      await db.raw(
        `with m as (select id, row_number() over (order by name) n from machines),
              p as (select array_agg(id order by email) ids from members)
         insert into reservations (machine_id, member_id, starts_at, ends_at, blocked_until, status, created_at, cancelled_at, checked_in_at)
         select m.id, p.ids[(1 + (g::bigint * 7919 + m.n * 104729) % ${MEMBERS + 1})::int], r.starts, r.starts + interval '1 hour', r.starts + interval '1 hour',
                case when (g + m.n) % 10 = 0 then 'no_show' when (g + m.n) % 15 = 0 then 'cancelled' else 'checked_in' end,
                r.starts - interval '2 days',
                case when (g + m.n) % 10 <> 0 and (g + m.n) % 15 = 0 then r.starts - interval '1 day' end,
                case when (g + m.n) % 10 <> 0 and (g + m.n) % 15 <> 0 then r.starts end
         from m cross join p
         cross join generate_series(1, 365 * 24 / ${RESERVATION_EVERY_HOURS}) g
         cross join lateral (select date_trunc('hour', now()) - g * interval '${RESERVATION_EVERY_HOURS} hours' as starts) r`,
      );
      await db.raw(
        `with m as (select array_agg(id order by name) ids from machines),
              p as (select array_agg(id order by email) ids from members),
              t as (select array_agg(id order by name) ids from trainings),
              reasons as (select array['sign_off_missing', 'sign_off_expired', 'waiver_missing', 'machine_in_use', 'shop_closed', 'unknown_badge'] codes,
                                 array[2, 2, 1, 5, 7, null]::int[] rules)
         insert into station_denials (at, machine_id, member_id, code, rule, training_id)
         select now() - (g * interval '365 days' / ?), m.ids[1 + g % ${MACHINES}],
                case when g % 6 = 5 then null else p.ids[(1 + (g::bigint * 7919) % ${MEMBERS + 1})::int] end,
                reasons.codes[1 + g % 6], reasons.rules[1 + g % 6],
                case when g % 6 < 2 then t.ids[1 + g % ${TRAININGS}] end
         from generate_series(1, ?) g cross join m cross join p cross join t cross join reasons`,
        [DENIALS, DENIALS],
      );
      await db.raw(
        `with m as (select id, row_number() over (order by email) n from members where role = 'member'),
              t as (select id, row_number() over (order by name) n from trainings),
              i as (select array_agg(id order by email) ids from members where role = 'instructor')
         insert into sign_offs (member_id, training_id, level, checklist, signed_by, signed_at, expires_at)
         select m.id, t.id, 'independent', '[]'::jsonb, i.ids[1 + (m.n + t.n) % ${INSTRUCTORS}],
                now() - ((m.n * 13 + t.n * 31) % 365) * interval '1 day', now() + interval '400 days'
         from m cross join t cross join i where (m.n + t.n) % 4 = 0`,
      );
    });

    await timed('vacuum analyze and checkpoint', async () => {
      await db.raw('vacuum analyze');
      await db.raw('checkpoint');
    });
    writeFileSync(output, JSON.stringify({ email, password }));
  } finally {
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
