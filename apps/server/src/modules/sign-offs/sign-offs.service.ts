import type { ChecklistItem, SignOff, SignOffCreate } from '@chuckkey/core';
import { can, daysUntilExpiry, fullName, signOffExpiry, signOffState, signOffStateLabels, toCsv } from '@chuckkey/core';
import { AppError, badRequest, conflict, forbidden, notFound } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { auditLog } from '../audit/audit.repository';
import { membersRepository } from '../members/members.repository';
import { shopRepository } from '../shop/shop.repository';
import { trainingsRepository } from '../trainings/trainings.repository';
import { signOffsRepository, type SeenChecklist, type SignOffRecord } from './sign-offs.repository';

export function toSignOff(row: SignOffRecord, now: Date): SignOff {
  return {
    id: row.id,
    memberId: row.memberId,
    memberName: fullName(row.memberFirstName, row.memberLastName),
    trainingId: row.trainingId,
    trainingName: row.trainingName,
    level: row.level,
    checklist: row.checklist,
    note: row.note,
    signedBy: { id: row.signedById, name: fullName(row.signedByFirstName, row.signedByLastName) },
    signedVia: row.signedVia,
    signedAt: row.signedAt.toISOString(),
    expiresAt: row.expiresAt?.toISOString() ?? null,
    revokedAt: row.revokedAt?.toISOString() ?? null,
    revokeReason: row.revokeReason,
    state: signOffState(row, now),
    machines: row.machines,
  };
}

/**
 * The training's checklist as it stands, each item marked seen. Every item must have been seen:
 * a sign-off vouches for all of it. Ids the training does not have mean the form was stale.
 */
function seenChecklist(items: readonly ChecklistItem[], seenIds: readonly string[]): SeenChecklist {
  const seen = new Set(seenIds);
  const missing = items.filter((item) => !seen.has(item.id));
  if (missing.length) {
    throw badRequest(
      'checklist_incomplete',
      `Every practical item must be seen before signing off. Not ticked: ${missing.map((item) => item.label).join('; ')}.`,
      { checklist: missing.map((item) => item.label) },
    );
  }
  const known = new Set(items.map((item) => item.id));
  const unknown = [...seen].filter((id) => !known.has(id));
  if (unknown.length) {
    throw badRequest('checklist_unknown_items', 'The checklist names items this training does not have. Reload the training and tick again.', {
      checklist: unknown.map((id) => `The training has no item "${id}".`),
    });
  }
  return items.map((item) => ({ ...item, seen: true }));
}

export type SignOffReportStatus = 'expiring' | 'expired';

export function signOffsService({ db }: Deps) {
  const signOffs = signOffsRepository(db);

  return {
    /** Records a sign-off given on the web or at a station, with its audit entry, in one transaction. */
    async create(actor: Express.User, input: SignOffCreate, via: 'web' | 'station'): Promise<SignOff> {
      if (!can(actor.role, 'create:sign-off:any')) throw forbidden('Only instructors and admins sign members off.');
      if (input.memberId === actor.id) {
        throw new AppError(403, 'cannot_sign_off_self', 'Nobody can sign themselves off. Ask another instructor to see your work.');
      }
      const now = new Date();
      return db.transaction(async (trx) => {
        const repository = signOffsRepository(trx);
        const member = await repository.memberForSignOff(input.memberId);
        if (!member) throw notFound('member_not_found', 'There is no member with that id.');
        const training = await trainingsRepository(trx).findById(input.trainingId);
        if (!training) throw notFound('training_not_found', 'There is no training with that id.');
        if (!member.active) {
          throw conflict('member_inactive', 'This membership is not active, so the member cannot be signed off. An admin can reactivate it first.');
        }
        if (!training.active) throw conflict('training_inactive', 'This training is retired; sign members off on its current version.');
        const checklist = seenChecklist(training.checklist, input.checklist);
        const { timeZone } = await shopRepository(trx).get();
        const expiresAt = signOffExpiry(now, training.validityMonths, timeZone);
        const id = await repository.insert({
          memberId: member.id,
          trainingId: training.id,
          level: input.level,
          checklist,
          note: input.note,
          signedBy: actor.id,
          signedVia: via,
          signedAt: now,
          expiresAt,
        });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'sign_off.created',
          entity: 'sign_off',
          entityId: id,
          memberId: member.id,
          details: { trainingId: training.id, trainingName: training.name, level: input.level, via, expiresAt: expiresAt?.toISOString() ?? null },
        });
        const created = await repository.findById(id);
        if (!created) throw new Error(`sign-off ${id} vanished inside its own transaction`);
        return toSignOff(created, now);
      });
    },

    async revoke(actor: Express.User, id: string, reason: string): Promise<SignOff> {
      if (!can(actor.role, 'revoke:sign-off:any')) throw forbidden('Only instructors and admins revoke sign-offs.');
      const now = new Date();
      return db.transaction(async (trx) => {
        const repository = signOffsRepository(trx);
        if (!(await repository.revoke(id, actor.id, reason, now))) {
          if (await repository.exists(id)) throw conflict('already_revoked', 'This sign-off was already revoked.');
          throw notFound('sign_off_not_found', 'There is no sign-off with that id.');
        }
        const revoked = await repository.findById(id);
        if (!revoked) throw new Error(`sign-off ${id} vanished inside its own transaction`);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'sign_off.revoked',
          entity: 'sign_off',
          entityId: id,
          memberId: revoked.memberId,
          details: { trainingId: revoked.trainingId, trainingName: revoked.trainingName, reason },
        });
        return toSignOff(revoked, now);
      });
    },

    /** A member's own sign-offs, or anyone's for those who may read them; newest first. */
    async listForMember(actor: Express.User, memberId: string): Promise<SignOff[]> {
      if (actor.id !== memberId && !can(actor.role, 'read:sign-off:any')) throw forbidden('You can only see your own sign-offs.');
      if (!(await membersRepository(db).findById(memberId))) throw notFound('member_not_found', 'There is no member with that id.');
      const now = new Date();
      return (await signOffs.listForMember(memberId)).map((row) => toSignOff(row, now));
    },

    async report(status: SignOffReportStatus, now = new Date()): Promise<SignOff[]> {
      return (await signOffs.report(status, now)).map((row) => toSignOff(row, now));
    },

    async reportCsv(status: SignOffReportStatus, now = new Date()): Promise<string> {
      const rows = await signOffs.report(status, now);
      const { timeZone } = await shopRepository(db).get();
      return toCsv(rows, [
        { header: 'Member', value: (r: SignOffRecord) => fullName(r.memberFirstName, r.memberLastName) },
        { header: 'E-mail', value: (r) => r.memberEmail },
        { header: 'Training', value: (r) => r.trainingName },
        { header: 'Level', value: (r) => (r.level === 'supervised' ? 'Supervised' : 'Independent') },
        { header: 'State', value: (r) => signOffStateLabels[signOffState(r, now)] },
        { header: 'Signed at', value: (r) => r.signedAt.toISOString() },
        { header: 'Signed by', value: (r) => fullName(r.signedByFirstName, r.signedByLastName) },
        { header: 'Expires at', value: (r) => r.expiresAt?.toISOString() ?? '' },
        { header: 'Days to expiry', value: (r) => (r.expiresAt ? daysUntilExpiry(r.expiresAt, now, timeZone) : '') },
      ]);
    },
  };
}
