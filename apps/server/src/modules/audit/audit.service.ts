import type { AuditEntry, AuditPage, AuditQuery } from '@chuckkey/core';
import { toCsv } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { auditLog } from './audit.repository';

const CSV_EXPORT_LIMIT = 100_000;

export function auditService({ db }: Deps) {
  const log = auditLog(db);
  return {
    async list(query: AuditQuery): Promise<AuditPage> {
      return log.list(query, { limit: query.pageSize, offset: (query.page - 1) * query.pageSize });
    },

    async exportCsv(query: AuditQuery): Promise<string> {
      const { items } = await log.list(query, { limit: CSV_EXPORT_LIMIT, offset: 0 });
      return toCsv(items, [
        { header: 'At', value: (e: AuditEntry) => e.at },
        { header: 'Action', value: (e) => e.action },
        { header: 'By', value: (e) => e.actor?.name ?? '' },
        { header: 'Member', value: (e) => e.member?.name ?? '' },
        { header: 'Entity', value: (e) => e.entity },
        { header: 'Entity id', value: (e) => e.entityId },
        { header: 'Details', value: (e) => JSON.stringify(e.details) },
      ]);
    },
  };
}
