import type { Knex } from 'knex';

/**
 * Reservations: a member's claimed time window on a reservable machine, and the booking rules each
 * machine carries (set by admins). Times are stored in UTC; the rules that count in days and weeks
 * work on the shop's calendar in `shop.time_zone`.
 */

const ruleColumns = [
  'slot_minutes',
  'max_minutes',
  'buffer_minutes',
  'horizon_days',
  'weekly_quota_minutes',
  'check_in_minutes',
  'no_show_grace_minutes',
  'no_show_limit',
  'no_show_window_days',
  'suspension_days',
] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('machines', (t) => {
    t.integer('slot_minutes').notNullable().defaultTo(15);
    t.integer('max_minutes').notNullable().defaultTo(120);
    t.integer('buffer_minutes').notNullable().defaultTo(0);
    t.integer('horizon_days').notNullable().defaultTo(14);
    t.integer('weekly_quota_minutes').notNullable().defaultTo(360);
    t.integer('check_in_minutes').notNullable().defaultTo(10);
    t.integer('no_show_grace_minutes').notNullable().defaultTo(15);
    t.integer('no_show_limit').notNullable().defaultTo(3);
    t.integer('no_show_window_days').notNullable().defaultTo(30);
    t.integer('suspension_days').notNullable().defaultTo(7);
    // A step must divide the day, or slots would drift from one day to the next.
    t.check('slot_minutes between 5 and 240 and 1440 % slot_minutes = 0', [], 'machines_slot_divides_day');
    t.check('max_minutes >= slot_minutes and max_minutes <= 1440 and max_minutes % slot_minutes = 0', [], 'machines_max_in_slots');
    t.check('buffer_minutes between 0 and 240', [], 'machines_buffer_range');
    t.check('horizon_days between 1 and 365', [], 'machines_horizon_range');
    t.check('weekly_quota_minutes between 0 and 10080', [], 'machines_quota_range');
    t.check('check_in_minutes between 0 and 120', [], 'machines_check_in_range');
    t.check('no_show_grace_minutes between 0 and 120', [], 'machines_grace_range');
    t.check('no_show_limit >= 1', [], 'machines_no_show_limit_positive');
    t.check('no_show_window_days between 1 and 365', [], 'machines_no_show_window_range');
    t.check('suspension_days between 0 and 365', [], 'machines_suspension_range');
  });

  // btree_gist lets one GiST index compare the machine's uuid with = beside the range's &&.
  await knex.raw('create extension if not exists btree_gist');

  await knex.schema.createTable('reservations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    // A class hold has the instructor who set it as its member.
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.timestamp('starts_at', { useTz: true }).notNullable();
    t.timestamp('ends_at', { useTz: true }).notNullable();
    // The end plus the machine's cleanup buffer at the time of booking: the next claim may start here.
    t.timestamp('blocked_until', { useTz: true }).notNullable();
    t.text('status').notNullable().defaultTo('active');
    t.text('kind').notNullable().defaultTo('member');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('cancelled_at', { useTz: true });
    t.timestamp('checked_in_at', { useTz: true });
    t.check('ends_at > starts_at', [], 'reservations_end_after_start');
    t.check('blocked_until >= ends_at', [], 'reservations_blocked_through_end');
    t.check("status in ('active', 'checked_in', 'cancelled', 'released', 'no_show')", [], 'reservations_status_known');
    t.check("kind in ('member', 'class')", [], 'reservations_kind_known');
    t.check("(status = 'cancelled') = (cancelled_at is not null)", [], 'reservations_cancelled_has_time');
    t.check("status <> 'checked_in' or checked_in_at is not null", [], 'reservations_checked_in_has_time');
    t.index(['member_id', 'starts_at']);
  });

  // Two live claims on one machine can never overlap, whatever races between requests or server
  // processes; ranges are half-open, so one claim may start where the last one's buffer ends.
  await knex.raw(`
    alter table reservations add constraint reservations_no_overlap exclude using gist (
      machine_id with =,
      tstzrange(starts_at, blocked_until) with &&
    ) where (status in ('active', 'checked_in'))
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('reservations');
  // Dropping the columns drops their checks with them.
  await knex.schema.alterTable('machines', (t) => {
    t.dropColumns(...ruleColumns);
  });
  // btree_gist stays: other tables may come to rely on it, and keeping it costs nothing.
}
