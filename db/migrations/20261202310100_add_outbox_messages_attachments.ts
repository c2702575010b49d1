import type { Knex } from 'knex';

// The caught mail's text attachments (a reservation's calendar entry), so the Outbox shows what was sent.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('outbox_messages', (t) => {
    t.jsonb('attachments').notNullable().defaultTo('[]');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('outbox_messages', (t) => {
    t.dropColumn('attachments');
  });
}
