import type { Knex } from 'knex';

/**
 * The shop's weekly opening hours and its closures (clearance rule 7). Times and dates are the
 * shop's wall clock and calendar in `shop.time_zone`, so an opening of 09:00–17:00 stays so across
 * daylight-saving changes. No rows in `shop_hours` means no hours are set and the shop counts as
 * open at all times, so a new shop is not locked out of its machines.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shop_hours', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    // ISO 8601 weekday: Monday 1 … Sunday 7.
    t.smallint('weekday').notNullable();
    t.time('opens_at').notNullable();
    // An opening until midnight closes at 24:00:00, which PostgreSQL's time type keeps as the end of the day.
    t.time('closes_at').notNullable();
    t.check('weekday between 1 and 7', [], 'shop_hours_iso_weekday');
    t.check('closes_at > opens_at', [], 'shop_hours_close_after_open');
  });
  // Two openings of one weekday never overlap (they may touch). Minutes of the week as an integer
  // range need no btree_gist extension; the ranges are half-open, so 24:00 of one day touches 00:00
  // of the next without overlapping it.
  await knex.raw(`
    alter table shop_hours add constraint shop_hours_no_overlap exclude using gist (
      int4range(
        weekday * 1440 + (extract(epoch from opens_at) / 60)::int,
        weekday * 1440 + (extract(epoch from closes_at) / 60)::int
      ) with &&
    )
  `);

  await knex.schema.createTable('shop_closures', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    // Whole days, both included.
    t.date('starts_on').notNullable();
    t.date('ends_on').notNullable();
    t.text('reason').notNullable();
    t.uuid('created_by').references('id').inTable('members').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check('ends_on >= starts_on', [], 'shop_closures_end_after_start');
    t.check("btrim(reason) <> ''", [], 'shop_closures_reason_given');
    // Every scan reads the closures around today.
    t.index(['ends_on', 'starts_on']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('shop_closures');
  await knex.schema.dropTable('shop_hours');
}
