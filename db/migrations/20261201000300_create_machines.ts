import type { Knex } from 'knex';

const categories = ['lathe', 'mill', 'mig_welder', 'tig_welder', 'band_saw', 'drill_press', 'surface_grinder'];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('machines', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable().unique();
    t.text('category').notNullable();
    t.uuid('area_id').notNullable().references('id').inTable('areas');
    t.boolean('reservable').notNullable().defaultTo(false);
    t.decimal('meter_hours', 10, 2).notNullable().defaultTo(0);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check(`category in (${categories.map((c) => `'${c}'`).join(', ')})`, [], 'machines_category_known');
    t.check('meter_hours >= 0', [], 'machines_meter_not_negative');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('machines');
}
