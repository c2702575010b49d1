import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('machine_sessions', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    t.uuid('member_id').notNullable().references('id').inTable('members');
    t.uuid('station_id').references('id').inTable('stations').onDelete('SET NULL');
    t.timestamp('started_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('ended_at', { useTz: true });
    t.text('ended_by');
    // The station sends one key per press of "End session", so a replay after a network
    // failure finds the session it already ended instead of ending it twice.
    t.uuid('end_idempotency_key').unique();
    // Worked out once at the end and added to the machine's meter in the same transaction.
    t.decimal('hours', 10, 4);
    // The machine's safety items the member confirmed: [{ id, label }].
    t.jsonb('checklist').notNullable().defaultTo('[]');
    t.check("ended_by is null or ended_by in ('member', 'supervisor', 'admin', 'heartbeat', 'next_member')", [], 'machine_sessions_ended_by_known');
    t.check('ended_at is null or ended_at >= started_at', [], 'machine_sessions_end_after_start');
    t.check('(ended_at is null) = (ended_by is null) and (ended_at is null) = (hours is null)', [], 'machine_sessions_end_complete');
    t.index(['member_id', 'started_at']);
    t.index(['machine_id', 'started_at']);
  });
  // One running session per machine, whatever races between stations or processes.
  await knex.raw('create unique index machine_sessions_one_running_per_machine on machine_sessions (machine_id) where ended_at is null');

  await knex.schema.createTable('duty_shifts', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.timestamp('started_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('ended_at', { useTz: true });
    t.check('ended_at is null or ended_at >= started_at', [], 'duty_shifts_end_after_start');
  });
  await knex.raw('create unique index duty_shifts_one_open_per_member on duty_shifts (member_id) where ended_at is null');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('duty_shifts');
  await knex.schema.dropTable('machine_sessions');
}
