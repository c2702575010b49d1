import type { Role } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface InvitationRecord {
  id: string;
  email: string;
  firstName: string;
  lastName: string;
  role: Role;
  invitedBy: string;
  expiresAt: Date;
  acceptedAt: Date | null;
  createdAt: Date;
}

const columns = {
  id: 'invitations.id',
  email: 'invitations.email',
  firstName: 'invitations.first_name',
  lastName: 'invitations.last_name',
  role: 'invitations.role',
  expiresAt: 'invitations.expires_at',
  acceptedAt: 'invitations.accepted_at',
  createdAt: 'invitations.created_at',
};

export function invitationsRepository(db: Db) {
  const open = () =>
    db('invitations')
      .join('members as inviter', 'inviter.id', 'invitations.invited_by')
      .whereNull('invitations.accepted_at')
      .whereNull('invitations.revoked_at')
      .andWhere('invitations.expires_at', '>', db.fn.now());

  const select = { ...columns, invitedBy: db.raw("inviter.first_name || ' ' || inviter.last_name") };

  return {
    async listOpen(): Promise<InvitationRecord[]> {
      return open().select(select).orderBy('invitations.created_at', 'desc');
    },

    async findOpenByTokenHash(tokenHash: string): Promise<InvitationRecord | undefined> {
      return open().first(select).where('invitations.token_hash', tokenHash);
    },

    /** Replaces any open invitation to the same address, so only the newest link works. */
    async create(invitation: { email: string; firstName: string; lastName: string; role: Role; invitedBy: string; tokenHash: string; expiresAt: Date }): Promise<InvitationRecord> {
      return db.transaction(async (trx) => {
        await trx('invitations')
          .where({ email: invitation.email })
          .whereNull('accepted_at')
          .whereNull('revoked_at')
          .update({ revoked_at: trx.fn.now() });
        const [row] = await trx('invitations')
          .insert({
            email: invitation.email,
            first_name: invitation.firstName,
            last_name: invitation.lastName,
            role: invitation.role,
            invited_by: invitation.invitedBy,
            token_hash: invitation.tokenHash,
            expires_at: invitation.expiresAt,
          })
          .returning('id');
        const created = await trx('invitations')
          .join('members as inviter', 'inviter.id', 'invitations.invited_by')
          .first(select)
          .where('invitations.id', row.id);
        return created as InvitationRecord;
      });
    },

    async revoke(id: string): Promise<void> {
      await db('invitations').where({ id }).update({ revoked_at: db.fn.now() });
    },

    /** Marks the invitation used; false when someone else used it first. */
    async markAccepted(trx: Db, id: string): Promise<boolean> {
      const count = await trx('invitations').where({ id }).whereNull('accepted_at').whereNull('revoked_at').update({ accepted_at: trx.fn.now() });
      return count === 1;
    },
  };
}
