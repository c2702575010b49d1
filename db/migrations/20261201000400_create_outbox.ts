import type { Knex } from 'knex';

// Mail caught by the development SMTP catcher, shown to admins on the Outbox page.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('outbox_messages', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('message_id');
    t.text('from_address').notNullable();
    t.specificType('to_addresses', 'text[]').notNullable();
    t.text('subject').notNullable().defaultTo('');
    t.text('text_body').notNullable().defaultTo('');
    t.text('html_body');
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['received_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('outbox_messages');
}
