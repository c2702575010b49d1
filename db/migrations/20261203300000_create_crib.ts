import type { Knex } from 'knex';

/**
 * The tool crib: tools that are lent and must come back, and consumables that are taken by count
 * and charged. One table holds both kinds so that a checkout points at one item, whichever it is;
 * checks keep each kind's own columns filled and the other kind's empty.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('crib_items', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('kind').notNullable();
    t.text('name').notNullable();
    t.text('bin_location');
    // Tools only.
    t.text('asset_tag');
    t.text('serial_number');
    t.text('condition');
    t.boolean('in_circulation').notNullable().defaultTo(true);
    // Null means due at the shop's closing time on the day it goes out.
    t.integer('loan_period_hours');
    // Consumables only.
    t.text('unit');
    t.integer('stock');
    t.integer('reorder_level');
    t.integer('price_cents');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("kind in ('tool', 'consumable')", [], 'crib_items_kind_known');
    t.check("btrim(name) <> ''", [], 'crib_items_name_given');
    t.check(
      "kind <> 'tool' or (asset_tag is not null and condition is not null and unit is null and stock is null and reorder_level is null and price_cents is null)",
      [],
      'crib_items_tool_columns',
    );
    t.check(
      "kind <> 'consumable' or (asset_tag is null and serial_number is null and condition is null and loan_period_hours is null and unit is not null and stock is not null and price_cents is not null)",
      [],
      'crib_items_consumable_columns',
    );
    t.check("condition is null or condition in ('good', 'needs_attention', 'damaged')", [], 'crib_items_condition_known');
    // Stock can never go below zero, whatever races between takes: a take that would is refused here.
    t.check('stock is null or stock >= 0', [], 'crib_items_stock_not_negative');
    t.check('reorder_level is null or reorder_level >= 0', [], 'crib_items_reorder_level_not_negative');
    t.check('price_cents is null or price_cents >= 0', [], 'crib_items_price_not_negative');
    t.check('loan_period_hours is null or loan_period_hours > 0', [], 'crib_items_loan_period_positive');
    // The checkouts table points at (id, kind) so that a checkout's kind always matches its item's.
    t.unique(['id', 'kind'], { indexName: 'crib_items_id_kind' });
  });
  // One asset tag per tool: its QR label names exactly one item.
  await knex.raw('create unique index crib_items_asset_tag_unique on crib_items (asset_tag) where asset_tag is not null');

  await knex.schema.createTable('crib_checkouts', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('item_id').notNullable();
    t.text('item_kind').notNullable();
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.integer('quantity').notNullable();
    t.timestamp('checked_out_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    // Null for a consumable take: what is used up is never due back.
    t.timestamp('due_at', { useTz: true });
    t.timestamp('returned_at', { useTz: true });
    t.text('return_condition');
    t.text('return_note');
    // Kept as null if the person is deleted: the crib's history outlives their account.
    t.uuid('recorded_by').references('id').inTable('members').onDelete('SET NULL');
    t.uuid('returned_recorded_by').references('id').inTable('members').onDelete('SET NULL');
    t.foreign(['item_id', 'item_kind']).references(['id', 'kind']).inTable('crib_items').onDelete('CASCADE');
    t.check('quantity > 0', [], 'crib_checkouts_quantity_positive');
    t.check("item_kind <> 'tool' or (quantity = 1 and due_at is not null)", [], 'crib_checkouts_tool_one_due');
    t.check(
      "item_kind <> 'consumable' or (due_at is null and returned_at is null and return_condition is null and return_note is null)",
      [],
      'crib_checkouts_consumable_never_returned',
    );
    t.check(
      "(returned_at is null and return_condition is null and return_note is null and returned_recorded_by is null) or (returned_at is not null and return_condition in ('good', 'needs_attention', 'damaged'))",
      [],
      'crib_checkouts_return_complete',
    );
    t.check('returned_at is null or returned_at >= checked_out_at', [], 'crib_checkouts_returned_after_out');
    t.index(['member_id', 'checked_out_at']);
  });
  // A tool is out to at most one member at a time, whatever races between requests or stations.
  await knex.raw("create unique index crib_checkouts_one_open_per_tool on crib_checkouts (item_id) where item_kind = 'tool' and returned_at is null");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('crib_checkouts');
  await knex.schema.dropTable('crib_items');
}
