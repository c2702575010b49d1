import type { Db } from '../../lib/db';

export function authRepository(db: Db) {
  return {
    async recordSignIn(attempt: { email: string; ip: string; succeeded: boolean }): Promise<void> {
      await db('sign_in_attempts').insert(attempt);
    },

    /** Failed sign-ins in the window, for this account and for this address, in one query. */
    async recentFailures(email: string, ip: string, windowMinutes: number): Promise<{ account: number; address: number }> {
      const row = await db('sign_in_attempts')
        .where({ succeeded: false })
        .andWhere('attempted_at', '>', db.raw("now() - make_interval(mins => ?)", [windowMinutes]))
        .andWhere((w) => w.where({ email }).orWhere({ ip }))
        .first({
          account: db.raw('count(*) filter (where email = ?)', [email]),
          address: db.raw('count(*) filter (where ip = ?)', [ip]),
        });
      return { account: Number(row?.account ?? 0), address: Number(row?.address ?? 0) };
    },

    async createResetToken(memberId: string, tokenHash: string, expiresAt: Date): Promise<void> {
      await db('password_reset_tokens').insert({ member_id: memberId, token_hash: tokenHash, expires_at: expiresAt });
    },

    /** Marks an unused, unexpired token used and returns its member, in one statement. */
    async consumeResetToken(tokenHash: string): Promise<string | undefined> {
      const [row] = await db('password_reset_tokens')
        .where({ token_hash: tokenHash })
        .whereNull('used_at')
        .andWhere('expires_at', '>', db.fn.now())
        .update({ used_at: db.fn.now() })
        .returning('member_id');
      return row?.member_id as string | undefined;
    },

    async expireResetTokens(memberId: string): Promise<void> {
      await db('password_reset_tokens').where({ member_id: memberId }).whereNull('used_at').update({ used_at: db.fn.now() });
    },
  };
}
