/**
 * Fills a migrated, empty database with a shop the size the scan benchmark asks for (see
 * scripts/bench-scan.mjs): 10,000 members with badges, 100 machines with paired stations and
 * 1,000,000 past sessions, a year of reservations on every machine, opening hours and closures,
 * a crib with a year of loans and some tools overdue, with the shop's overdue block on, and four
 * blocking maintenance tasks a machine with a year of completions.
 * Writes the badge codes and station device tokens it made, as JSON, to
 * the file named by BENCH_OUTPUT. Never run it against a database that holds real data.
 */
import { createHash, randomBytes } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import knexFactory from 'knex';
import { badgeCodeBox, badgeCodeHash, generateBadgeCode } from './badge-codes';
import { env, timed } from './bench-support';
import { knexConfig } from './config';

const MEMBERS = 10_000;
const INSTRUCTORS = 20;
const MACHINES = 100;
const TRAININGS = 20;
const SESSIONS = 1_000_000;
/** Each machine has a two-hour reservation every RESERVATION_EVERY_HOURS, a year back and a fortnight ahead. */
const RESERVATION_EVERY_HOURS = 6;
/** Tools in the crib; a year of daily loans of each makes about 180,000 returned checkouts. */
const CRIB_TOOLS = 500;
const BATCH = 1_000;

async function main(): Promise<void> {
  const db = knexFactory(knexConfig(env('DATABASE_URL'), { min: 1, max: 2 }));
  const box = badgeCodeBox(env('BADGE_SECRET'));
  const output = env('BENCH_OUTPUT');
  try {
    await timed('areas, members, trainings, machines', async () => {
      await db.raw(`insert into areas (name, sort_order) select 'Area ' || g, g from generate_series(1, 4) g`);
      // Member 1 is an admin, 2..21 instructors, the rest members; one constant password hash.
      await db.raw(
        `insert into members (email, first_name, last_name, role, password_hash)
         select 'member' || g || '@bench.example', 'First' || g, 'Last' || g,
                case when g = 1 then 'admin' when g <= ? then 'instructor' else 'member' end,
                '$argon2id$v=19$m=19456,t=2,p=1$bench$bench'
         from generate_series(1, ?) g`,
        [INSTRUCTORS + 1, MEMBERS],
      );
      await db.raw(
        `insert into trainings (name, validity_months) select 'Training ' || g, 24 from generate_series(1, ?) g`,
        [TRAININGS],
      );
      await db.raw(
        `with a as (select array_agg(id order by sort_order) ids from areas),
              c as (select array['lathe', 'mill', 'mig_welder', 'tig_welder', 'band_saw', 'drill_press', 'surface_grinder'] names)
         insert into machines (name, category, area_id, safety_checklist)
         select 'Machine ' || g, c.names[1 + g % 7], a.ids[1 + g % 4],
                '[{"id":"guards-closed","label":"The guards are closed"},{"id":"eyes-protected","label":"I am wearing safety glasses"}]'::jsonb
         from generate_series(1, ?) g, a, c`,
        [MACHINES],
      );
      // Each machine needs one training; every other machine a second one as well.
      await db.raw(
        `with m as (select id, row_number() over (order by name) n from machines),
              t as (select id, row_number() over (order by name) n from trainings)
         insert into machine_trainings (machine_id, training_id)
         select m.id, t.id from m join t on t.n = 1 + m.n % ${TRAININGS}
         union
         select m.id, t.id from m join t on t.n = 1 + (m.n + 7) % ${TRAININGS} where m.n % 2 = 0`,
      );
    });

    await timed('waiver, waiver records, sign-offs, one supervisor on duty', async () => {
      await db.raw(`insert into waiver_versions (version, title, body) values (1, 'Shop waiver', 'I will follow the shop rules.')`);
      // Nine members in ten have the waiver on file.
      await db.raw(
        `insert into waiver_records (member_id, version, method, typed_name, recorded_by)
         select id, 1, 'accepted_online', first_name || ' ' || last_name, id
         from (select id, first_name, last_name, row_number() over (order by email) n from members) m
         where n % 10 <> 0`,
      );
      // Each member is signed off on about a third of the trainings by one of the instructors;
      // one sign-off in eight is supervised only and one in twenty has lapsed.
      await db.raw(
        `with m as (select id, row_number() over (order by created_at, email) n from members),
              t as (select id, row_number() over (order by name) n from trainings),
              i as (select array_agg(id order by email) ids from members where role = 'instructor')
         insert into sign_offs (member_id, training_id, level, checklist, signed_by, signed_at, expires_at)
         select m.id, t.id,
                case when (m.n + t.n) % 8 = 0 then 'supervised' else 'independent' end,
                '[]'::jsonb,
                case when i.ids[1 + t.n % ${INSTRUCTORS}] = m.id then i.ids[1 + (t.n + 1) % ${INSTRUCTORS}] else i.ids[1 + t.n % ${INSTRUCTORS}] end,
                now() - interval '200 days',
                case when (m.n + t.n) % 20 = 0 then now() - interval '10 days' else now() + interval '500 days' end
         from m cross join t cross join i
         where (m.n + t.n) % 3 = 0`,
      );
      await db.raw(`insert into duty_shifts (member_id) select id from members where role = 'instructor' order by email limit 1`);
    });

    const badges: string[] = [];
    await timed(`${MEMBERS} badges`, async () => {
      const members = await db('members').select('id').orderBy('email');
      for (let i = 0; i < members.length; i += BATCH) {
        const rows = members.slice(i, i + BATCH).map(({ id }: { id: string }) => {
          const code = generateBadgeCode();
          badges.push(code);
          return { member_id: id, code_hash: badgeCodeHash(code), code_encrypted: box.seal(code) };
        });
        await db('badges').insert(rows);
      }
    });

    const stations: string[] = [];
    await timed(`${MACHINES} paired stations`, async () => {
      const machines = await db('machines').select('id', 'name').orderBy('name');
      const rows = machines.map(({ id, name }: { id: string; name: string }) => {
        const token = randomBytes(32).toString('base64url');
        stations.push(token);
        return {
          kind: 'machine',
          machine_id: id,
          name: `${name} station`,
          device_token_hash: createHash('sha256').update(token).digest('hex'),
          paired_at: db.fn.now(),
          last_seen_at: db.fn.now(),
        };
      });
      await db('stations').insert(rows);
    });

    await timed(`${SESSIONS.toLocaleString('en')} past machine sessions`, async () => {
      // One session a minute, going back about two years, each between 6 minutes and 3 hours long.
      await db.raw(
        `with m as (select array_agg(id order by name) ids from machines),
              p as (select array_agg(id order by email) ids from members)
         insert into machine_sessions (machine_id, member_id, started_at, ended_at, ended_by, hours, checklist)
         select m.ids[1 + g % ${MACHINES}], p.ids[(1 + (g::bigint * 7919) % ${MEMBERS})::int], s.started, s.started + s.hours * interval '1 hour',
                'member', s.hours, '[]'::jsonb
         from generate_series(1, ?) g cross join m cross join p
         cross join lateral (select now() - g * interval '1 minute' - interval '4 hours' as started,
                                    round((0.1 + (g % 290) / 100.0)::numeric, 4) as hours) s`,
        [SESSIONS],
      );
    });

    await timed('opening hours, closures and a year of reservations', async () => {
      // Weekdays 08:00–22:00, weekends 09:00–18:00 (ISO weekdays 1–7), and a closure every month.
      await db.raw(
        `insert into shop_hours (weekday, opens_at, closes_at)
         select d, case when d <= 5 then time '08:00' else time '09:00' end, case when d <= 5 then time '22:00' else time '18:00' end
         from generate_series(1, 7) d`,
      );
      await db.raw(
        `insert into shop_closures (starts_on, ends_on, reason)
         select current_date + g * 30 + 3, current_date + g * 30 + 4, 'Closed for cleaning'
         from generate_series(-12, 2) g`,
      );
      // Past reservations were used (checked in), one in ten a no-show; those ahead are active.
      await db.raw(
        `with m as (select id, row_number() over (order by name) n from machines),
              p as (select array_agg(id order by email) ids from members)
         insert into reservations (machine_id, member_id, starts_at, ends_at, blocked_until, status, checked_in_at)
         select m.id, p.ids[(1 + ((g + 10000)::bigint * 7919 + m.n * 104729) % ${MEMBERS})::int], r.starts, r.starts + interval '2 hours',
                r.starts + interval '2 hours',
                case when r.starts > now() then 'active' when (g + m.n) % 10 = 0 then 'no_show' else 'checked_in' end,
                case when r.starts > now() or (g + m.n) % 10 = 0 then null else r.starts end
         from m cross join p
         cross join generate_series(-365 * 24 / ${RESERVATION_EVERY_HOURS}, 14 * 24 / ${RESERVATION_EVERY_HOURS}) g
         cross join lateral (select date_trunc('hour', now()) + g * interval '${RESERVATION_EVERY_HOURS} hours' + (m.n % 4) * interval '1 hour' as starts) r`,
      );
    });

    await timed('a crib of 500 tools, a year of returned loans, 400 out (100 overdue), the overdue block on', async () => {
      await db.raw(
        `insert into crib_items (kind, name, asset_tag, condition, bin_location)
         select 'tool', 'Tool ' || g, 'B-' || lpad(g::text, 4, '0'), 'good', 'Bin ' || (g % 40) from generate_series(1, ${CRIB_TOOLS}) g`,
      );
      // A loan a tool a day for a year, each back the same day; then 400 tools out now, the first 100 overdue.
      await db.raw(
        `with t as (select id, row_number() over (order by asset_tag) n from crib_items),
              p as (select array_agg(id order by email) ids from members)
         insert into crib_checkouts (item_id, item_kind, member_id, quantity, checked_out_at, due_at, returned_at, return_condition)
         select t.id, 'tool', p.ids[(1 + (g::bigint * 7919 + t.n * 104729) % ${MEMBERS})::int], 1,
                now() - (g + 1) * interval '1 day', now() - (g + 1) * interval '1 day' + interval '8 hours',
                now() - (g + 1) * interval '1 day' + interval '4 hours', 'good'
         from t cross join p cross join generate_series(1, 365) g`,
      );
      await db.raw(
        `with t as (select id, row_number() over (order by asset_tag) n from crib_items),
              p as (select array_agg(id order by email) ids from members)
         insert into crib_checkouts (item_id, item_kind, member_id, quantity, checked_out_at, due_at)
         select t.id, 'tool', p.ids[(1 + t.n * 24593 % ${MEMBERS})::int], 1, now() - interval '5 days',
                case when t.n <= 100 then now() - interval '4 days' else now() + interval '1 day' end
         from t cross join p where t.n <= 400`,
      );
      // Rule 8 on: every scan then probes the member's open tools (the dearer path).
      await db('shop').where({ id: 1 }).update({ overdue_checkout_block_days: 3 });
    });

    await timed('4 blocking maintenance tasks a machine, a year of weekly completions, none overdue', async () => {
      // Blocking, so every scan reads each task's latest completion (the dearer path); done a day
      // ago at the machine's meter, so nothing is overdue and the scans still clear.
      await db.raw(
        `insert into maintenance_tasks (machine_id, name, every_hours, every_days, blocking, start_meter_hours, created_at)
         select m.id, 'Task ' || g, case when g <= 2 then 500 end, case when g > 2 then 90 end, true, m.meter_hours, now() - interval '1 year'
         from machines m cross join generate_series(1, 4) g`,
      );
      await db.raw(
        `insert into maintenance_completions (task_id, done_at, meter_hours, note)
         select t.id, now() - interval '1 day' - w * interval '7 days', m.meter_hours, 'Done.'
         from maintenance_tasks t join machines m on m.id = t.machine_id cross join generate_series(0, 51) w`,
      );
    });

    // A shop's tables are vacuumed and checkpointed in the normal run of things; doing it here keeps
    // the autovacuum of a million fresh rows and the checkpoint after them out of the measurement.
    await timed('vacuum, analyze and checkpoint', async () => {
      await db.raw('vacuum (analyze)');
      await db.raw('checkpoint');
    });
    writeFileSync(output, JSON.stringify({ badges, stations }));
  } finally {
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
