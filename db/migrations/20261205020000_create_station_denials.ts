import type { Knex } from 'knex';

/**
 * Refused scans at machine stations, one row per reason: which trainings members are turned away
 * for, and how often each rule of the ladder refuses, for the usage review. Written in batches off
 * the scan's path (docs/decisions/015), so a row may land a second after its scan.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('station_denials', (t) => {
    t.bigIncrements('id').primary();
    t.timestamp('at', { useTz: true }).notNullable();
    // Kept as null if the station is removed: the refusal still happened at the machine.
    t.uuid('station_id').references('id').inTable('stations').onDelete('SET NULL');
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    // Null for a badge that belongs to no one; set to null if the person is deleted.
    t.uuid('member_id').references('id').inTable('members').onDelete('SET NULL');
    // A clearance reason code or unknown_badge; the codes are the API's, checked there.
    t.text('code').notNullable();
    // The rule of the ladder; an unknown badge is refused before any rule is checked.
    t.smallint('rule');
    // The training a sign_off_missing, sign_off_expired or sign_off_revoked reason is about.
    t.uuid('training_id').references('id').inTable('trainings').onDelete('SET NULL');
    t.check("code ~ '^[a-z_]+$'", [], 'station_denials_code_shape');
    t.check("(code = 'unknown_badge') = (rule is null)", [], 'station_denials_rule_unless_unknown_badge');
    t.check('rule is null or rule between 1 and 8', [], 'station_denials_rule_range');
    t.check("training_id is null or code like 'sign_off_%'", [], 'station_denials_training_for_sign_offs');
  });
  // Reports read a range of days: by reason, and by training for those that name one.
  await knex.raw('create index station_denials_at on station_denials (at) include (code, rule)');
  await knex.raw('create index station_denials_training_at on station_denials (at) include (training_id) where training_id is not null');
  // Usage reports read the sessions of a range of days. Most ranges are recent, so the sessions
  // ended after its start are the index's last entries; the included columns spare the table.
  await knex.raw('create index machine_sessions_ended_at on machine_sessions (ended_at) include (started_at, machine_id, member_id)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index machine_sessions_ended_at');
  await knex.schema.dropTable('station_denials');
}
