import type { Role } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface BadgeRecord {
  id: string;
  memberId: string;
  codeEncrypted: string;
  issuedAt: Date;
}

export interface BadgeHolder {
  id: string;
  firstName: string;
  lastName: string;
  role: Role;
  active: boolean;
}

export interface PhotoRecord {
  image: Buffer;
  contentType: string;
  updatedAt: Date;
}

const badgeColumns = {
  id: 'id',
  memberId: 'member_id',
  codeEncrypted: 'code_encrypted',
  issuedAt: 'issued_at',
} as const;

const holderColumns = {
  id: 'members.id',
  firstName: 'members.first_name',
  lastName: 'members.last_name',
  role: 'members.role',
  active: 'members.active',
} as const;

/** Pass a transaction as `db` to make several calls one change. */
export function badgesRepository(db: Db) {
  return {
    async findMember(id: string): Promise<BadgeHolder | undefined> {
      return db('members').first(holderColumns).where('members.id', id);
    },

    /** Locks the member's row until the transaction ends, so badge changes for one member run one at a time. */
    async lockMember(id: string): Promise<boolean> {
      const row = await db('members').first('id').where({ id }).forUpdate();
      return Boolean(row);
    },

    async findMembers(ids: string[]): Promise<BadgeHolder[]> {
      return db('members').select(holderColumns).whereIn('members.id', ids);
    },

    async findActive(memberId: string): Promise<BadgeRecord | undefined> {
      return db('badges').first(badgeColumns).where({ member_id: memberId }).whereNull('revoked_at');
    },

    /** Revokes the member's active badge, if any, and answers its id. */
    async revokeActive(memberId: string): Promise<string | undefined> {
      const [row] = await db('badges')
        .where({ member_id: memberId })
        .whereNull('revoked_at')
        .update({ revoked_at: db.fn.now() })
        .returning<{ id: string }[]>('id');
      return row?.id;
    },

    async insert(badge: { memberId: string; codeHash: string; codeEncrypted: string; issuedBy: string | null }): Promise<BadgeRecord> {
      const [row] = await db('badges')
        .insert({
          member_id: badge.memberId,
          code_hash: badge.codeHash,
          code_encrypted: badge.codeEncrypted,
          issued_by: badge.issuedBy,
        })
        .returning(Object.entries(badgeColumns).map(([alias, column]) => `${column} as ${alias}`));
      return row as BadgeRecord;
    },

    /** The holder of the active badge with this code hash; revoked codes find no one. */
    async findHolderByCodeHash(codeHash: string): Promise<BadgeHolder | undefined> {
      return db('badges')
        .join('members', 'members.id', 'badges.member_id')
        .first(holderColumns)
        .where('badges.code_hash', codeHash)
        .whereNull('badges.revoked_at');
    },

    async findPinHash(memberId: string): Promise<string | null> {
      const row = await db('members').first<{ pinHash: string | null } | undefined>({ pinHash: 'pin_hash' }).where({ id: memberId });
      return row?.pinHash ?? null;
    },

    async setPinHash(memberId: string, pinHash: string): Promise<boolean> {
      const count = await db('members').where({ id: memberId }).update({ pin_hash: pinHash, updated_at: db.fn.now() });
      return count > 0;
    },

    async findPhoto(memberId: string): Promise<PhotoRecord | undefined> {
      return db('member_photos').first({ image: 'image', contentType: 'content_type', updatedAt: 'updated_at' }).where({ member_id: memberId });
    },

    async findPhotos(memberIds: string[]): Promise<Map<string, Buffer>> {
      const rows: { memberId: string; image: Buffer }[] = await db('member_photos')
        .select({ memberId: 'member_id', image: 'image' })
        .whereIn('member_id', memberIds);
      return new Map(rows.map((r) => [r.memberId, r.image]));
    },

    async savePhoto(memberId: string, image: Buffer, contentType: string): Promise<void> {
      await db('member_photos')
        .insert({ member_id: memberId, image, content_type: contentType, updated_at: db.fn.now() })
        .onConflict('member_id')
        .merge(['image', 'content_type', 'updated_at']);
    },
  };
}
export type BadgesRepository = ReturnType<typeof badgesRepository>;
