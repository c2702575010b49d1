import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // PIN tries at stations, shared by every server process so that the limits per station and
  // per instructor hold however many processes answer the shop's stations.
  await knex.schema.createTable('station_pin_attempts', (t) => {
    t.bigIncrements('id');
    t.uuid('station_id').notNullable().references('id').inTable('stations').onDelete('CASCADE');
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.boolean('succeeded').notNullable();
    t.timestamp('attempted_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['station_id', 'attempted_at']);
    t.index(['member_id', 'attempted_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('station_pin_attempts');
}
