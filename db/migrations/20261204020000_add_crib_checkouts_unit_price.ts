import type { Knex } from 'knex';

/**
 * What one unit of a consumable cost when it was taken. The item's price may change later; the
 * member's charge is for the price they saw, so each take keeps its own. Tools are lent, not
 * sold, and carry none. Takes made before this column are given the item's price of today.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('crib_checkouts', (t) => {
    t.integer('unit_price_cents');
  });
  await knex.raw(
    "update crib_checkouts c set unit_price_cents = i.price_cents from crib_items i where i.id = c.item_id and c.item_kind = 'consumable'",
  );
  await knex.schema.alterTable('crib_checkouts', (t) => {
    t.check(
      "(item_kind = 'consumable' and unit_price_cents is not null and unit_price_cents >= 0) or (item_kind = 'tool' and unit_price_cents is null)",
      [],
      'crib_checkouts_unit_price_for_takes',
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('crib_checkouts', (t) => {
    t.dropChecks('crib_checkouts_unit_price_for_takes');
    t.dropColumn('unit_price_cents');
  });
}
