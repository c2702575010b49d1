import type { Knex } from 'knex';

// When the reminder before a reservation went out: set once, so that no run of the job mails twice.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('reservations', (t) => {
    t.timestamp('reminded_at', { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('reservations', (t) => {
    t.dropColumn('reminded_at');
  });
}
