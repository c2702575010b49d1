import type { Knex } from 'knex';

/**
 * A member's private calendar feed of their reservations: the secret in its URL is kept only as
 * its SHA-256, so the table alone opens no feed. One per member; making a new one replaces it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('calendar_feeds', (t) => {
    t.uuid('member_id').primary().references('id').inTable('members').onDelete('CASCADE');
    t.text('token_hash').notNullable().unique();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('calendar_feeds');
}
