import type { Knex } from 'knex';

/**
 * Overdue crib tools: how many reminders each checkout has had and when the last went out, so the
 * job claims a reminder by changing the row it reads; and the shop's policy of refusing machine
 * use to a member whose tool is overdue by more than a number of days (rule 8; null is off).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('crib_checkouts', (t) => {
    t.integer('overdue_notices_sent').notNullable().defaultTo(0);
    t.timestamp('last_overdue_notice_at', { useTz: true });
    // At most three reminders, and a count above zero always says when the last one went out.
    t.check('overdue_notices_sent between 0 and 3', [], 'crib_checkouts_overdue_notices_at_most_three');
    t.check('(overdue_notices_sent = 0) = (last_overdue_notice_at is null)', [], 'crib_checkouts_overdue_notice_has_time');
  });
  // Only the tools out now: as many rows as the crib has tools, however long its history grows.
  // Leading with the member, it is the scan's probe of one member's open tools (due time and item
  // read from the index alone); the reminder job and the overdue list read the whole of it, ordered
  // by due time within each member, which stays small for the same reason.
  await knex.raw(
    "create index crib_checkouts_open_tools_by_member on crib_checkouts (member_id, due_at) include (item_id) where item_kind = 'tool' and returned_at is null",
  );
  await knex.schema.alterTable('shop', (t) => {
    t.integer('overdue_checkout_block_days');
    t.check('overdue_checkout_block_days is null or overdue_checkout_block_days >= 0', [], 'shop_overdue_checkout_block_days_not_negative');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('shop', (t) => {
    t.dropChecks('shop_overdue_checkout_block_days_not_negative');
    t.dropColumn('overdue_checkout_block_days');
  });
  await knex.raw('drop index crib_checkouts_open_tools_by_member');
  await knex.schema.alterTable('crib_checkouts', (t) => {
    t.dropChecks(['crib_checkouts_overdue_notices_at_most_three', 'crib_checkouts_overdue_notice_has_time']);
    t.dropColumn('last_overdue_notice_at');
    t.dropColumn('overdue_notices_sent');
  });
}
