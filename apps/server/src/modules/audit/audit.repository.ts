import type { AuditAction, AuditEntry, AuditQuery } from '@chuckkey/core';
import { fullName } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface AuditRecordInput {
  /** Who did it; null when the system acted on its own. */
  actorId: string | null;
  action: AuditAction;
  entity: string;
  entityId: string;
  /** The member the entry is about, so their history can be read in one place. */
  memberId?: string | null;
  details?: Record<string, unknown>;
}

export type AuditFilters = Pick<AuditQuery, 'action' | 'memberId'>;

interface AuditRow {
  id: number;
  at: Date;
  action: string;
  entity: string;
  entityId: string;
  details: Record<string, unknown>;
  actorId: string | null;
  actorFirstName: string | null;
  actorLastName: string | null;
  memberId: string | null;
  memberFirstName: string | null;
  memberLastName: string | null;
}

function person(id: string | null, first: string | null, last: string | null) {
  return id ? { id, name: fullName(first ?? '', last ?? '') } : null;
}

function toEntry(row: AuditRow): AuditEntry {
  return {
    id: Number(row.id),
    at: row.at.toISOString(),
    action: row.action,
    actor: person(row.actorId, row.actorFirstName, row.actorLastName),
    member: person(row.memberId, row.memberFirstName, row.memberLastName),
    entity: row.entity,
    entityId: row.entityId,
    details: row.details,
  };
}

/**
 * The audit log. Pass a transaction as `db` to record an entry in the same transaction as the
 * change it describes: both land, or neither does.
 */
export function auditLog(db: Db) {
  function filtered(filters: AuditFilters) {
    const q = db('audit_log as a');
    if (filters.action) q.where('a.action', filters.action);
    // Entries about the member and entries by them: an instructor's history includes whom they signed off.
    if (filters.memberId) q.where((w) => w.where('a.member_id', filters.memberId).orWhere('a.actor_id', filters.memberId));
    return q;
  }

  return {
    async record(entry: AuditRecordInput): Promise<void> {
      await db('audit_log').insert({
        actor_id: entry.actorId,
        action: entry.action,
        entity: entry.entity,
        entity_id: entry.entityId,
        member_id: entry.memberId ?? null,
        details: JSON.stringify(entry.details ?? {}),
      });
    },

    async list(filters: AuditFilters, page: { limit: number; offset: number }): Promise<{ items: AuditEntry[]; total: number }> {
      const rows: (AuditRow & { total: number })[] = await filtered(filters)
        .leftJoin('members as actor', 'actor.id', 'a.actor_id')
        .leftJoin('members as member', 'member.id', 'a.member_id')
        .select({
          id: 'a.id',
          at: 'a.at',
          action: 'a.action',
          entity: 'a.entity',
          entityId: 'a.entity_id',
          details: 'a.details',
          actorId: 'a.actor_id',
          actorFirstName: 'actor.first_name',
          actorLastName: 'actor.last_name',
          memberId: 'a.member_id',
          memberFirstName: 'member.first_name',
          memberLastName: 'member.last_name',
          total: db.raw('count(*) over ()'),
        })
        .orderBy([{ column: 'a.at', order: 'desc' }, { column: 'a.id', order: 'desc' }])
        .limit(page.limit)
        .offset(page.offset);
      // A page past the end has no rows to carry the total; count apart only then.
      const total = rows[0] ? Number(rows[0].total) : page.offset > 0 ? await this.count(filters) : 0;
      return { items: rows.map(toEntry), total };
    },

    async count(filters: AuditFilters): Promise<number> {
      const [row] = await filtered(filters).count<{ count: number }[]>({ count: '*' });
      return Number(row?.count ?? 0);
    },
  };
}
export type AuditLog = ReturnType<typeof auditLog>;
