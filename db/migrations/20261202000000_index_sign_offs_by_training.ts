import type { Knex } from 'knex';

/**
 * A station's scan names who recently taught each training the machine needs: per teacher, the
 * latest sign-off of one training. These indexes answer that with a few probes, where before it
 * read every sign-off of every member.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('create index sign_offs_training_signer_idx on sign_offs (training_id, signed_by, signed_at)');
  await knex.raw("create index members_teachers_idx on members (id) where active and role in ('instructor', 'admin')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index members_teachers_idx');
  await knex.raw('drop index sign_offs_training_signer_idx');
}
