import type { Knex } from 'knex';

/**
 * Who has taught each training, and when they last signed a member off on it: one row per
 * training and signer, kept by a trigger on sign_offs so it can never disagree with them.
 *
 * A station's scan names up to three recent teachers of every training the machine needs. Read
 * from sign_offs that was one index probe per instructor per training, the costliest part of the
 * scan; from here it is the first few entries of one index.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('training_teachers', (t) => {
    t.uuid('training_id').notNullable().references('id').inTable('trainings').onDelete('CASCADE');
    t.uuid('member_id').notNullable().references('id').inTable('members').onDelete('CASCADE');
    t.timestamp('last_signed_at', { useTz: true }).notNullable();
    t.primary(['training_id', 'member_id']);
  });
  await knex.raw('create index training_teachers_latest_idx on training_teachers (training_id, last_signed_at desc)');
  await knex.raw(`
    insert into training_teachers (training_id, member_id, last_signed_at)
    select training_id, signed_by, max(signed_at) from sign_offs group by training_id, signed_by
  `);

  // After a sign-off goes (or changes its training, signer or time), its old pair is worked out
  // again from what remains; a new or changed sign-off moves its pair's latest time forward.
  await knex.raw(`
    create function training_teachers_follow() returns trigger language plpgsql as $$
    begin
      if tg_op in ('UPDATE', 'DELETE') then
        delete from training_teachers where training_id = old.training_id and member_id = old.signed_by;
        insert into training_teachers (training_id, member_id, last_signed_at)
        select old.training_id, old.signed_by, max(s.signed_at) from sign_offs s
        where s.training_id = old.training_id and s.signed_by = old.signed_by
        having max(s.signed_at) is not null
        on conflict (training_id, member_id) do update
          set last_signed_at = greatest(training_teachers.last_signed_at, excluded.last_signed_at);
      end if;
      if tg_op in ('INSERT', 'UPDATE') then
        insert into training_teachers (training_id, member_id, last_signed_at)
        values (new.training_id, new.signed_by, new.signed_at)
        on conflict (training_id, member_id) do update
          set last_signed_at = greatest(training_teachers.last_signed_at, excluded.last_signed_at);
      end if;
      return null;
    end
    $$
  `);
  await knex.raw(`
    create trigger sign_offs_training_teachers
    after insert or delete or update of training_id, signed_by, signed_at on sign_offs
    for each row execute function training_teachers_follow()
  `);
  // The scan no longer probes sign_offs by training and signer; nothing else reads that index.
  await knex.raw('drop index sign_offs_training_signer_idx');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('create index sign_offs_training_signer_idx on sign_offs (training_id, signed_by, signed_at)');
  await knex.raw('drop trigger sign_offs_training_teachers on sign_offs');
  await knex.raw('drop function training_teachers_follow()');
  await knex.schema.dropTable('training_teachers');
}
