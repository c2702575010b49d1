import type { Knex } from 'knex';

// The store of express-session (connect-pg-simple's table layout). Named web_sessions because
// "session" in Chuckkey means a member's use of a machine.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('web_sessions', (t) => {
    t.string('sid').primary();
    t.json('sess').notNullable();
    t.timestamp('expire', { useTz: false, precision: 6 }).notNullable();
    t.index(['expire'], 'web_sessions_expire_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('web_sessions');
}
