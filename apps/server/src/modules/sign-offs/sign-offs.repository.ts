import type { ChecklistItem, SignOffLevel } from '@chuckkey/core';
import { EXPIRING_SOON_DAYS } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export type SeenChecklist = (ChecklistItem & { seen: boolean })[];

/** A sign-off row with the names around it and the machines its training opens. */
export interface SignOffRecord {
  id: string;
  memberId: string;
  memberFirstName: string;
  memberLastName: string;
  memberEmail: string;
  trainingId: string;
  trainingName: string;
  level: SignOffLevel;
  checklist: SeenChecklist;
  note: string;
  signedById: string;
  signedByFirstName: string;
  signedByLastName: string;
  signedVia: 'web' | 'station';
  signedAt: Date;
  expiresAt: Date | null;
  revokedAt: Date | null;
  revokeReason: string | null;
  machines: { id: string; name: string }[];
}

export interface NewSignOff {
  memberId: string;
  trainingId: string;
  level: SignOffLevel;
  checklist: SeenChecklist;
  note: string;
  signedBy: string;
  signedVia: 'web' | 'station';
  signedAt: Date;
  expiresAt: Date | null;
}

export type ReminderKind = '30' | '7';

const DAY_MS = 86_400_000;

/**
 * A newer sign-off on the same training that is not revoked and still good at `now` makes an
 * older one moot: nobody needs reminding of it, and it is not on the report.
 */
function notSuperseded(db: Db, now: Date) {
  return db.raw(
    `not exists (
      select 1 from sign_offs newer
      where newer.member_id = s.member_id and newer.training_id = s.training_id
        and newer.signed_at > s.signed_at and newer.revoked_at is null
        and (newer.expires_at is null or newer.expires_at > ?)
    )`,
    [now],
  );
}

export function signOffsRepository(db: Db) {
  const select = () =>
    db('sign_offs as s')
      .join('members as m', 'm.id', 's.member_id')
      .join('trainings as t', 't.id', 's.training_id')
      .join('members as by', 'by.id', 's.signed_by')
      .select({
        id: 's.id',
        memberId: 's.member_id',
        memberFirstName: 'm.first_name',
        memberLastName: 'm.last_name',
        memberEmail: 'm.email',
        trainingId: 's.training_id',
        trainingName: 't.name',
        level: 's.level',
        checklist: 's.checklist',
        note: 's.note',
        signedById: 's.signed_by',
        signedByFirstName: 'by.first_name',
        signedByLastName: 'by.last_name',
        signedVia: 's.signed_via',
        signedAt: 's.signed_at',
        expiresAt: 's.expires_at',
        revokedAt: 's.revoked_at',
        revokeReason: 's.revoke_reason',
        machines: db.raw(
          `coalesce((
            select json_agg(json_build_object('id', mc.id, 'name', mc.name) order by mc.name)
            from machine_trainings mt join machines mc on mc.id = mt.machine_id
            where mt.training_id = s.training_id
          ), '[]'::json)`,
        ),
      });

  return {
    async findById(id: string): Promise<SignOffRecord | undefined> {
      return select().where('s.id', id).first();
    },

    async listForMember(memberId: string): Promise<SignOffRecord[]> {
      return select()
        .where('s.member_id', memberId)
        .orderBy([{ column: 's.signed_at', order: 'desc' }, { column: 's.id', order: 'desc' }]);
    },

    /**
     * Sign-offs of active members that lapse within 30 days of `now` (expiring) or have lapsed
     * (expired), leaving out revoked ones and those a newer sign-off has replaced.
     */
    async report(status: 'expiring' | 'expired', now: Date): Promise<SignOffRecord[]> {
      const q = select().where('m.active', true).whereNull('s.revoked_at').whereNotNull('s.expires_at').where(notSuperseded(db, now));
      if (status === 'expiring') {
        q.where('s.expires_at', '>', now)
          .where('s.expires_at', '<=', new Date(now.getTime() + EXPIRING_SOON_DAYS * DAY_MS))
          .orderBy([{ column: 's.expires_at' }, { column: 's.id' }]);
      } else {
        q.where('s.expires_at', '<=', now).orderBy([{ column: 's.expires_at', order: 'desc' }, { column: 's.id' }]);
      }
      return q;
    },

    async insert(signOff: NewSignOff): Promise<string> {
      const [row] = await db('sign_offs')
        .insert({
          member_id: signOff.memberId,
          training_id: signOff.trainingId,
          level: signOff.level,
          checklist: JSON.stringify(signOff.checklist),
          note: signOff.note,
          signed_by: signOff.signedBy,
          signed_via: signOff.signedVia,
          signed_at: signOff.signedAt,
          expires_at: signOff.expiresAt,
        })
        .returning('id');
      return (row as { id: string }).id;
    },

    /** Revokes it unless it already is; false when there was nothing left to revoke. */
    async revoke(id: string, by: string, reason: string, at: Date): Promise<boolean> {
      const rows = await db('sign_offs')
        .where({ id })
        .whereNull('revoked_at')
        .update({ revoked_at: at, revoked_by: by, revoke_reason: reason })
        .returning('id');
      return rows.length > 0;
    },

    async exists(id: string): Promise<boolean> {
      return Boolean(await db('sign_offs').first('id').where({ id }));
    },

    /**
     * Sign-offs that a reminder is due for at `now`: within 7 days and no 7-day mail yet, or
     * within 30 days and no 30-day mail yet. Only active members, never revoked or replaced ones.
     */
    async dueReminders(now: Date): Promise<(SignOffRecord & { kind: ReminderKind })[]> {
      const in7 = new Date(now.getTime() + 7 * DAY_MS);
      const in30 = new Date(now.getTime() + EXPIRING_SOON_DAYS * DAY_MS);
      return select()
        .select({ kind: db.raw("case when s.expires_at <= ? then '7' else '30' end", [in7]) })
        .where('m.active', true)
        .whereNull('s.revoked_at')
        .where('s.expires_at', '>', now)
        .where((w) =>
          w
            .where((w7) => w7.where('s.expires_at', '<=', in7).whereNull('s.reminded_7_at'))
            .orWhere((w30) => w30.where('s.expires_at', '<=', in30).where('s.expires_at', '>', in7).whereNull('s.reminded_30_at')),
        )
        .where(notSuperseded(db, now))
        .orderBy([{ column: 's.expires_at' }, { column: 's.id' }]);
    },

    /**
     * Marks the reminder sent, in one UPDATE … RETURNING, only if no one has yet: of two
     * processes claiming the same sign-off, one gets the row and the other nothing. A 7-day mail
     * also stands for the 30-day one, so a late 30-day mail never follows it.
     */
    async claimReminder(id: string, kind: ReminderKind, now: Date): Promise<boolean> {
      const q = db('sign_offs').where({ id }).whereNull('revoked_at');
      const rows = await (kind === '7'
        ? q.whereNull('reminded_7_at').update({ reminded_7_at: now, reminded_30_at: db.raw('coalesce(reminded_30_at, ?)', [now]) })
        : q.whereNull('reminded_30_at').update({ reminded_30_at: now })
      ).returning('id');
      return rows.length > 0;
    },

    /** Locks the member's row against deactivation while the sign-off is written. */
    async memberForSignOff(memberId: string): Promise<{ id: string; active: boolean } | undefined> {
      return db('members').first('id', 'active').where({ id: memberId }).forShare();
    },
  };
}
export type SignOffsRepository = ReturnType<typeof signOffsRepository>;
