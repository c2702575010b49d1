import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('trainings', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable().unique();
    t.text('description').notNullable().defaultTo('');
    // Practical checklist: [{ id, label }]; ids stay stable so sign-offs can name what was seen.
    t.jsonb('checklist').notNullable().defaultTo('[]');
    t.integer('validity_months').notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check('validity_months >= 0 and validity_months <= 120', [], 'trainings_validity_range');
  });

  await knex.schema.alterTable('machines', (t) => {
    // Safety checklist the member confirms before a session: [{ id, label }].
    t.jsonb('safety_checklist').notNullable().defaultTo('[]');
    t.boolean('requires_pin').notNullable().defaultTo(false);
    t.text('description').notNullable().defaultTo('');
  });

  await knex.schema.createTable('machine_trainings', (t) => {
    t.uuid('machine_id').notNullable().references('id').inTable('machines').onDelete('CASCADE');
    t.uuid('training_id').notNullable().references('id').inTable('trainings').onDelete('RESTRICT');
    t.primary(['machine_id', 'training_id']);
    t.index(['training_id']);
  });

  await knex.schema.createTable('sign_offs', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('member_id').notNullable().references('id').inTable('members');
    t.uuid('training_id').notNullable().references('id').inTable('trainings');
    t.text('level').notNullable();
    // The training's checklist as it stood, each item marked seen: [{ id, label, seen }].
    t.jsonb('checklist').notNullable();
    t.text('note').notNullable().defaultTo('');
    t.uuid('signed_by').notNullable().references('id').inTable('members');
    t.text('signed_via').notNullable().defaultTo('web');
    t.timestamp('signed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('expires_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.uuid('revoked_by').references('id').inTable('members');
    t.text('revoke_reason');
    t.timestamp('reminded_30_at', { useTz: true });
    t.timestamp('reminded_7_at', { useTz: true });
    t.check("level in ('supervised', 'independent')", [], 'sign_offs_level_known');
    t.check("signed_via in ('web', 'station')", [], 'sign_offs_via_known');
    // Nobody signs themselves off, whatever the code does.
    t.check('signed_by <> member_id', [], 'sign_offs_not_self');
    t.check('(revoked_at is null) = (revoke_reason is null)', [], 'sign_offs_revoke_has_reason');
    t.check('expires_at is null or expires_at > signed_at', [], 'sign_offs_expiry_after_signing');
    t.index(['member_id', 'training_id']);
    t.index(['expires_at']);
  });

  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id');
    t.uuid('actor_id').references('id').inTable('members');
    t.text('action').notNullable();
    t.text('entity').notNullable();
    t.text('entity_id').notNullable();
    t.uuid('member_id').references('id').inTable('members');
    t.jsonb('details').notNullable().defaultTo('{}');
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['at']);
    t.index(['member_id', 'at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
  await knex.schema.dropTable('sign_offs');
  await knex.schema.dropTable('machine_trainings');
  await knex.schema.alterTable('machines', (t) => {
    t.dropColumn('safety_checklist');
    t.dropColumn('requires_pin');
    t.dropColumn('description');
  });
  await knex.schema.dropTable('trainings');
}
