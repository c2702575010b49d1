import type { Knex } from 'knex';

/**
 * A crib item's photo, kept beside the item like member photos beside members: the picture helps
 * an attendant find the right tool on the shelf and see its state when it went out.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('crib_item_photos', (t) => {
    t.uuid('item_id').primary().references('id').inTable('crib_items').onDelete('CASCADE');
    t.binary('image').notNullable();
    t.text('content_type').notNullable();
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('crib_item_photos');
}
