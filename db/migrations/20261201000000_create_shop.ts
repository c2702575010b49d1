import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.raw('create extension if not exists citext');

  // One shop per database: the row with id 1.
  await knex.schema.createTable('shop', (t) => {
    t.smallint('id').primary().defaultTo(1);
    t.text('name').notNullable();
    t.text('town').notNullable();
    t.text('time_zone').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check('id = 1', [], 'shop_single_row');
  });

  await knex.schema.createTable('areas', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable().unique();
    t.integer('sort_order').notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('areas');
  await knex.schema.dropTable('shop');
}
