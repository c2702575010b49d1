import type { Db } from '../../lib/db';

/** Pass a transaction as `db` to make several calls one change. */
export function dutyRepository(db: Db) {
  return {
    /** Ends the member's open shift; false when they had none. */
    async endOpenShift(memberId: string): Promise<boolean> {
      const ended = await db('duty_shifts').where({ member_id: memberId }).whereNull('ended_at').update({ ended_at: db.fn.now() });
      return ended > 0;
    },

    /** Opens a shift; a shift opened at the same moment by another request counts as this one. */
    async startShift(memberId: string): Promise<void> {
      await db.raw(
        `insert into duty_shifts (member_id) values (?) on conflict (member_id) where ended_at is null do nothing`,
        [memberId],
      );
    },
  };
}
