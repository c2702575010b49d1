import type { Member, MemberListQuery, MemberPage, MemberUpdate } from '@chuckkey/core';
import { toCsv } from '@chuckkey/core';
import { conflict, notFound } from '../../lib/errors';
import type { Deps } from '../../lib/deps';
import { auditLog } from '../audit/audit.repository';
import { membersRepository, toMember } from './members.repository';

const CSV_EXPORT_LIMIT = 100_000;

export function membersService({ db }: Deps) {
  const members = membersRepository(db);
  return {
    async list(query: MemberListQuery): Promise<MemberPage> {
      const { items, total } = await members.list(query);
      return { items: items.map(toMember), total, page: query.page, pageSize: query.pageSize };
    },

    async exportCsv(query: MemberListQuery): Promise<string> {
      const { items } = await members.list({ ...query, page: 1, pageSize: CSV_EXPORT_LIMIT });
      return toCsv(items.map(toMember), [
        { header: 'First name', value: (m: Member) => m.firstName },
        { header: 'Last name', value: (m) => m.lastName },
        { header: 'E-mail', value: (m) => m.email },
        { header: 'Role', value: (m) => m.role },
        { header: 'Active', value: (m) => (m.active ? 'yes' : 'no') },
        { header: 'Joined', value: (m) => m.createdAt },
      ]);
    },

    async update(actor: Express.User, id: string, changes: MemberUpdate): Promise<Member> {
      // An admin who demotes or deactivates themself could leave the shop with no admin.
      if (actor.id === id && ((changes.role && changes.role !== actor.role) || changes.active === false)) {
        throw conflict('cannot_change_self', 'You cannot change your own role or deactivate yourself. Ask another admin.');
      }
      // The change and its audit entries commit together: no role change goes unrecorded.
      const updated = await db.transaction(async (trx) => {
        const repository = membersRepository(trx);
        const before = await repository.findByIdForUpdate(id);
        if (!before) throw notFound('member_not_found', 'There is no member with that id.');
        const after = await repository.update(id, changes);
        if (!after) throw notFound('member_not_found', 'There is no member with that id.');
        const audit = auditLog(trx);
        const entry = { actorId: actor.id, entity: 'member', entityId: id, memberId: id };
        if (before.role !== after.role) {
          await audit.record({ ...entry, action: 'member.role_changed', details: { before: { role: before.role }, after: { role: after.role } } });
        }
        if (before.active !== after.active) {
          await audit.record({
            ...entry,
            action: after.active ? 'member.reactivated' : 'member.deactivated',
            details: { before: { active: before.active }, after: { active: after.active } },
          });
        }
        if (changes.active === false) await repository.endWebSessions(id);
        return after;
      });
      return toMember(updated);
    },
  };
}
